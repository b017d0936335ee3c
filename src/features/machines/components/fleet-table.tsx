import { useMemo } from 'react';
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { cx } from '../../../components/ui/cx';
import type { Machine, MachineFilters, MachineSortField } from '../api/types';
import { SORT_LABELS } from '../lib/fleet-filters';
import { fleetColumns } from './fleet-columns';

interface FleetTableProps {
  machines: Machine[];
  filters: MachineFilters;
  onSort: (sort: MachineSortField, order: 'asc' | 'desc') => void;
  machineHref: (id: string) => string;
  timeZone: string;
  /** a new page or sort is on its way; the old rows stay visible but dimmed */
  refreshing: boolean;
}

/**
 * The fleet as a table. Sorting, filtering and paging all happen on the server (the table only
 * renders the page it is given), so a fleet of thousands never comes to the browser at once.
 */
export function FleetTable({
  machines,
  filters,
  onSort,
  machineHref,
  timeZone,
  refreshing,
}: FleetTableProps) {
  const columns = useMemo(() => fleetColumns({ machineHref, timeZone }), [machineHref, timeZone]);
  const sorting: SortingState = [{ id: filters.sort, desc: filters.order === 'desc' }];
  const table = useReactTable({
    data: machines,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (machine) => machine.id,
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    state: { sorting },
  });

  return (
    <div className="overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card">
      <table className={cx('w-full text-left', refreshing && 'opacity-60')} aria-busy={refreshing}>
        <caption className="sr-only">
          Fleet, sorted by {sortLabel(filters.sort)} (
          {filters.order === 'asc' ? 'ascending' : 'descending'})
        </caption>
        <thead className="border-b-2 border-field-200 bg-oat-50">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sortField = header.column.columnDef.meta?.sortField;
                const active = sortField === filters.sort;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={
                      sortField
                        ? active
                          ? filters.order === 'asc'
                            ? 'ascending'
                            : 'descending'
                          : 'none'
                        : undefined
                    }
                    className={cx(
                      'px-3 py-2 text-sm font-black text-field-800',
                      header.column.columnDef.meta?.className,
                    )}
                  >
                    {sortField ? (
                      <button
                        type="button"
                        className="-mx-2 inline-flex min-h-touch items-center gap-1 rounded-lg px-2 whitespace-nowrap hover:bg-field-100"
                        onClick={() =>
                          onSort(sortField, active && filters.order === 'asc' ? 'desc' : 'asc')
                        }
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortIndicator direction={active ? filters.order : null} />
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-field-100">
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              className={cx(
                'align-top hover:bg-oat-50',
                row.original.status === 'tagged_out' && 'bg-poppy-50/60',
                row.original.status === 'sold' && 'text-field-600',
              )}
            >
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-3">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function SortIndicator({ direction }: { direction: 'asc' | 'desc' | null }) {
  // decoration: aria-sort on the header cell tells assistive technology the order
  return (
    <svg
      viewBox="0 0 16 16"
      aria-hidden="true"
      className={cx('size-4 shrink-0', direction ? 'text-field-900' : 'text-field-300')}
    >
      <path d="M8 2.5l3.5 4h-7z" fill="currentColor" opacity={direction === 'desc' ? 0.25 : 1} />
      <path d="M8 13.5l-3.5-4h7z" fill="currentColor" opacity={direction === 'asc' ? 0.25 : 1} />
    </svg>
  );
}

const sortLabel = (sort: MachineSortField) => SORT_LABELS[sort];
