import { useEffect, useId, useState, type ReactNode } from 'react';
import {
  CATEGORY_LABELS,
  DUE_HORIZONS,
  DUE_STATUSES,
  DUE_STATUS_LABELS,
  MACHINE_CATEGORIES,
  type MachineCategory,
} from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { BoardFilters, CustomerRef } from '../api/types';
import { DEFAULT_BOARD_HORIZON } from '../filters';

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

// Five fields stack into five rows on a phone and push the first service off the screen: below
// this width they fold behind a "Filters" button that says how many are set.
export const FIELDS_FIT = '(min-width: 1024px)';

/** How many of the board's filters differ from a fresh board (a longer horizon counts). */
export const activeBoardFilters = (f: BoardFilters) =>
  [f.horizon !== DEFAULT_BOARD_HORIZON, f.customerId, f.category, f.status, f.task.trim()].filter(
    Boolean,
  ).length;

/** Horizon, customer, category, status and task name of the board; a change starts at page 1. */
export function BoardFiltersBar({
  filters,
  customers,
  onChange,
  beside,
}: {
  filters: BoardFilters;
  customers: CustomerRef[];
  onChange: (change: BoardFilterChange) => void;
  /** shown beside the folded "Filters" button (the CSV link on a phone, saving a row) */
  beside?: ReactNode;
}) {
  // The task name is sent a moment after typing stops, not on every key.
  const [task, setTask] = useState(filters.task);
  useEffect(() => setTask(filters.task), [filters.task]);
  useEffect(() => {
    if (task === filters.task) return;
    const timer = setTimeout(() => onChange({ task }), 400);
    return () => clearTimeout(timer);
  }, [task, filters.task, onChange]);
  const wide = useMediaQuery(FIELDS_FIT);
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const active = activeBoardFilters(filters);

  const fields = (
    <div id={panelId} className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
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
  if (wide) return fields;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <Button
          variant="secondary"
          icon="sliders"
          aria-expanded={open}
          aria-controls={panelId}
          onClick={() => setOpen((o) => !o)}
        >
          Filters{active ? ` (${active} on)` : ''}
        </Button>
        {beside}
      </div>
      {open ? fields : null}
    </div>
  );
}
