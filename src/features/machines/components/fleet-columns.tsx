import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { CATEGORY_LABELS } from '../../../../shared/constants';
import {
  DueStatusBadge,
  MachineStatusBadge,
  RestrictedBadge,
} from '../../../components/ui/status-badges';
import { formatLocalDate } from '../../../lib/fleet-format';
import type { Machine, MachineSortField } from '../api/types';
import { MeterReadingSummary } from './meter-reading-summary';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData, TValue> {
    /** the server's sort field for this column; columns without one are not sortable */
    sortField?: MachineSortField;
    className?: string;
  }
}

const column = createColumnHelper<Machine>();

interface ColumnContext {
  machineHref: (id: string) => string;
  timeZone: string;
}

export function fleetColumns({ machineHref, timeZone }: ColumnContext) {
  return [
    column.accessor('fleetNumber', {
      id: 'fleetNumber',
      header: 'Fleet number',
      meta: { sortField: 'fleetNumber', className: 'w-32' },
      cell: (info) => (
        <Link
          to={machineHref(info.row.original.id)}
          className="inline-flex min-h-touch items-center font-black text-field-950 underline decoration-field-300 underline-offset-4 hover:decoration-field-800"
        >
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('name', {
      id: 'name',
      header: 'Name',
      meta: { sortField: 'name' },
      cell: (info) => <span className="text-field-900">{info.getValue()}</span>,
    }),
    column.accessor('category', {
      id: 'category',
      header: 'Category',
      meta: { sortField: 'category' },
      cell: (info) => CATEGORY_LABELS[info.getValue()],
    }),
    column.accessor('lastReading', {
      id: 'meter',
      header: 'Meter',
      cell: (info) => (
        <MeterReadingSummary
          lastReading={info.getValue()}
          unit={info.row.original.meterUnit}
          timeZone={timeZone}
        />
      ),
    }),
    column.accessor('dueStatus', {
      id: 'dueStatus',
      header: 'Due state',
      cell: (info) => {
        const status = info.getValue();
        return status ? (
          <DueStatusBadge status={status} />
        ) : (
          <span className="text-field-600">No schedule</span>
        );
      },
    }),
    column.accessor('nextDueDate', {
      id: 'nextDue',
      header: 'Next due',
      meta: { sortField: 'nextDue' },
      cell: (info) => {
        const date = info.getValue();
        return date ? (
          <span className="whitespace-nowrap tabular-nums">{formatLocalDate(date)}</span>
        ) : (
          <span className="text-field-600">—</span>
        );
      },
    }),
    column.accessor('status', {
      id: 'status',
      header: 'Status',
      meta: { sortField: 'status' },
      // a restriction is said beside the status, with its reason (the table has no hover-only text)
      cell: (info) => {
        const { restriction } = info.row.original;
        return (
          <span className="flex flex-col items-start gap-1">
            <MachineStatusBadge status={info.getValue()} />
            {restriction ? <RestrictedBadge /> : null}
            {restriction?.reason ? (
              <span className="max-w-56 text-sm text-straw-900">{restriction.reason}</span>
            ) : null}
          </span>
        );
      },
    }),
  ];
}
