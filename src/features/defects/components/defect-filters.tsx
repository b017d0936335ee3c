import {
  DEFECT_SEVERITIES,
  DEFECT_SEVERITY_LABELS,
  type DefectSeverity,
} from '../../../../shared/schemas/defects';
import { SelectField } from '../../../components/ui/field';
import type { DefectFilters, DefectStatusFilter, MachineOption, PersonRef } from '../api/types';

const STATUS_OPTIONS: { value: DefectStatusFilter; label: string }[] = [
  { value: 'active', label: 'Open or in repair' },
  { value: 'open', label: 'Open' },
  { value: 'in_repair', label: 'In repair' },
  { value: 'fixed', label: 'Fixed' },
  { value: 'all', label: 'All' },
];

const SEVERITY_OPTIONS = [
  { value: '', label: 'Any severity' },
  ...DEFECT_SEVERITIES.map((s) => ({ value: s, label: DEFECT_SEVERITY_LABELS[s] })),
];

/** Status (active by default), severity, machine and, for the shop, who it is assigned to. */
export function DefectFiltersBar({
  filters,
  machines,
  people,
  onChange,
}: {
  filters: DefectFilters;
  machines: MachineOption[];
  /** null: the caller does not assign defects, so no "Assigned to" filter */
  people: PersonRef[] | null;
  onChange: (next: DefectFilters) => void;
}) {
  const set = (change: Partial<DefectFilters>) => onChange({ ...filters, ...change, page: 1 });
  return (
    <div
      role="group"
      aria-label="Filter defects"
      className="grid grid-cols-1 gap-3 rounded-xl border border-field-200 bg-white p-4 min-[420px]:grid-cols-2 lg:grid-cols-4"
    >
      <SelectField
        label="Status"
        options={STATUS_OPTIONS}
        value={filters.status}
        onChange={(event) => set({ status: event.target.value as DefectStatusFilter })}
      />
      <SelectField
        label="Severity"
        options={SEVERITY_OPTIONS}
        value={filters.severity ?? ''}
        onChange={(event) =>
          set({ severity: (event.target.value || undefined) as DefectSeverity | undefined })
        }
      />
      <SelectField
        label="Machine"
        options={[
          { value: '', label: 'All machines' },
          ...machines.map((m) => ({ value: m.id, label: `${m.fleetNumber} · ${m.name}` })),
        ]}
        value={filters.machineId ?? ''}
        onChange={(event) => set({ machineId: event.target.value || undefined })}
      />
      {people ? (
        <SelectField
          label="Assigned to"
          options={[
            { value: '', label: 'Anyone' },
            { value: 'me', label: 'Me' },
            { value: 'none', label: 'Nobody yet' },
            ...people.map((p) => ({ value: p.id, label: p.name })),
          ]}
          value={filters.assignedTo ?? ''}
          onChange={(event) => set({ assignedTo: event.target.value || undefined })}
        />
      ) : null}
    </div>
  );
}
