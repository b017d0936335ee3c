import { useEffect, useState } from 'react';
import {
  CATEGORY_LABELS,
  DUE_HORIZONS,
  DUE_STATUSES,
  DUE_STATUS_LABELS,
  MACHINE_CATEGORIES,
  type MachineCategory,
} from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { SelectField, TextField } from '../../../components/ui/field';
import type { BoardFilters, CustomerRef } from '../api/types';

export type BoardFilterChange = Partial<Omit<BoardFilters, 'pageSize' | 'page'>>;

const HORIZONS = DUE_HORIZONS.map((d) => ({ value: String(d), label: `Next ${d} days` }));
const CATEGORIES = [
  { value: '', label: 'All categories' },
  ...MACHINE_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] })),
];
const STATUSES = [
  { value: '', label: 'All statuses' },
  ...DUE_STATUSES.map((s) => ({ value: s, label: DUE_STATUS_LABELS[s] })),
];

/** Horizon, customer, category, status and task name of the board; a change starts at page 1. */
export function BoardFiltersBar({
  filters,
  customers,
  onChange,
}: {
  filters: BoardFilters;
  customers: CustomerRef[];
  onChange: (change: BoardFilterChange) => void;
}) {
  // The task name is sent a moment after typing stops, not on every key.
  const [task, setTask] = useState(filters.task);
  useEffect(() => setTask(filters.task), [filters.task]);
  useEffect(() => {
    if (task === filters.task) return;
    const timer = setTimeout(() => onChange({ task }), 400);
    return () => clearTimeout(timer);
  }, [task, filters.task, onChange]);

  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
      <SelectField
        label="Horizon"
        options={HORIZONS}
        value={String(filters.horizon)}
        onChange={(e) => onChange({ horizon: Number(e.target.value) })}
      />
      <SelectField
        label="Customer"
        options={[
          { value: '', label: 'All customers' },
          ...customers.map((c) => ({ value: c.id, label: c.name })),
        ]}
        value={filters.customerId ?? ''}
        onChange={(e) => onChange({ customerId: e.target.value || null })}
      />
      <SelectField
        label="Category"
        options={CATEGORIES}
        value={filters.category ?? ''}
        onChange={(e) => onChange({ category: (e.target.value || null) as MachineCategory | null })}
      />
      <SelectField
        label="Status"
        options={STATUSES}
        value={filters.status ?? ''}
        onChange={(e) => onChange({ status: (e.target.value || null) as DueStatus | null })}
      />
      <TextField
        label="Task name"
        type="search"
        placeholder="e.g. oil"
        value={task}
        maxLength={100}
        onChange={(e) => setTask(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') onChange({ task });
        }}
      />
    </div>
  );
}
