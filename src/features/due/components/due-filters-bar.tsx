import {
  CATEGORY_LABELS,
  DUE_HORIZONS,
  DUE_STATUSES,
  DUE_STATUS_LABELS,
  MACHINE_CATEGORIES,
  type MachineCategory,
} from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { SelectField } from '../../../components/ui/field';
import type { DueFilters } from '../api/types';

const HORIZON_OPTIONS = DUE_HORIZONS.map((days) => ({
  value: String(days),
  label: `Next ${days} days`,
}));
const CATEGORY_OPTIONS = [
  { value: '', label: 'All categories' },
  ...MACHINE_CATEGORIES.map((category) => ({ value: category, label: CATEGORY_LABELS[category] })),
];
const STATUS_OPTIONS = [
  { value: '', label: 'All statuses' },
  ...DUE_STATUSES.map((status) => ({ value: status, label: DUE_STATUS_LABELS[status] })),
];

type FilterChange = Partial<Pick<DueFilters, 'horizon' | 'category' | 'status'>>;

/** Horizon, category and status of the due list; every change starts again at page 1. */
export function DueFiltersBar({
  filters,
  onChange,
}: {
  filters: DueFilters;
  onChange: (change: FilterChange) => void;
}) {
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <SelectField
        label="Horizon"
        options={HORIZON_OPTIONS}
        value={String(filters.horizon)}
        onChange={(event) => onChange({ horizon: Number(event.target.value) })}
      />
      <SelectField
        label="Category"
        options={CATEGORY_OPTIONS}
        value={filters.category ?? ''}
        onChange={(event) =>
          onChange({ category: (event.target.value || null) as MachineCategory | null })
        }
      />
      <SelectField
        label="Status"
        options={STATUS_OPTIONS}
        value={filters.status ?? ''}
        onChange={(event) => onChange({ status: (event.target.value || null) as DueStatus | null })}
      />
    </div>
  );
}
