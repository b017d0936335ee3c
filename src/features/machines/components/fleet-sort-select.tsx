import { SelectField } from '../../../components/ui/field';
import { MACHINE_SORT_FIELDS, type MachineFilters, type MachineSortField } from '../api/types';
import { SORT_LABELS } from '../lib/fleet-filters';

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

const OPTIONS = MACHINE_SORT_FIELDS.flatMap((field) => [
  { value: `${field}:asc`, label: `${capitalise(SORT_LABELS[field])}, ${orderWords(field).asc}` },
  { value: `${field}:desc`, label: `${capitalise(SORT_LABELS[field])}, ${orderWords(field).desc}` },
]);

function orderWords(field: MachineSortField) {
  return field === 'nextDue'
    ? { asc: 'soonest first', desc: 'latest first' }
    : { asc: 'A to Z', desc: 'Z to A' };
}

/** The cards have no column headers to click, so the order is chosen here. */
export function FleetSortSelect({
  filters,
  onSort,
}: {
  filters: MachineFilters;
  onSort: (sort: MachineSortField, order: 'asc' | 'desc') => void;
}) {
  return (
    <SelectField
      label="Sort by"
      options={OPTIONS}
      value={`${filters.sort}:${filters.order}`}
      onChange={(event) => {
        const [sort, order] = event.target.value.split(':') as [MachineSortField, 'asc' | 'desc'];
        onSort(sort, order);
      }}
    />
  );
}
