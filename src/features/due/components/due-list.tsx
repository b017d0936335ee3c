import { DueStatusBadge } from '../../../components/ui/status-badges';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { DueRow } from '../api/types';
import { DueAtFigure, ProjectedFigure, RemainingFigure } from './due-figures';
import { DueMachine, DueTask } from './due-task-cell';

interface DueListProps {
  rows: DueRow[];
  machineHref: (machineId: string) => string;
}

// The table's columns need the content column of a 1280 px window (about 960 px beside the side
// bar); narrower windows get the cards, so no column is cut off.
const TABLE_FITS = '(min-width: 1280px)';

/**
 * The due rows in the server's order (overdue first, then by date). A table where there is room
 * for its six columns; stacked cards on phones and narrow windows.
 */
export function DueList({ rows, machineHref }: DueListProps) {
  const wide = useMediaQuery(TABLE_FITS);
  return wide ? (
    <DueTable rows={rows} machineHref={machineHref} />
  ) : (
    <DueCards rows={rows} machineHref={machineHref} />
  );
}

const th = 'px-2.5 py-2 text-left text-sm font-bold text-field-700';
const td = 'px-2.5 py-3 align-top';

function DueTable({ rows, machineHref }: DueListProps) {
  return (
    <div className="overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card">
      <table className="w-full border-collapse">
        <caption className="sr-only">Due services</caption>
        <thead className="border-b border-field-200 bg-oat-100">
          <tr>
            <th scope="col" className={th}>
              Status
            </th>
            <th scope="col" className={th}>
              Machine
            </th>
            <th scope="col" className={th}>
              Task
            </th>
            <th scope="col" className={th}>
              Due at
            </th>
            <th scope="col" className={th}>
              Projected
            </th>
            <th scope="col" className={th}>
              Remaining
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-field-100">
          {rows.map((row) => (
            <tr key={row.taskId} className={row.due.status === 'overdue' ? 'bg-poppy-50/40' : ''}>
              <td className={td}>
                <DueStatusBadge status={row.due.status} />
              </td>
              <td className={`${td} min-w-44`}>
                <DueMachine row={row} href={machineHref(row.machine.id)} />
              </td>
              <td className={td}>
                <DueTask row={row} />
              </td>
              <td className={`${td} min-w-28`}>
                <DueAtFigure row={row} />
              </td>
              <td className={`${td} min-w-32`}>
                <ProjectedFigure row={row} />
              </td>
              <td className={`${td} whitespace-nowrap`}>
                <RemainingFigure row={row} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function DueCards({ rows, machineHref }: DueListProps) {
  return (
    <ul aria-label="Due services" className="flex flex-col gap-3">
      {rows.map((row) => (
        <li
          key={row.taskId}
          className={`rounded-xl border bg-white p-4 shadow-card ${
            row.due.status === 'overdue' ? 'border-poppy-300' : 'border-field-200'
          }`}
        >
          <div className="flex flex-col gap-2">
            <div>
              <DueStatusBadge status={row.due.status} />
            </div>
            <DueMachine row={row} href={machineHref(row.machine.id)} />
            <DueTask row={row} />
            <dl className="grid grid-cols-2 gap-x-4 gap-y-2 border-t border-field-100 pt-2">
              <div>
                <dt className="text-sm font-bold text-field-600">Due at</dt>
                <dd>
                  <DueAtFigure row={row} />
                </dd>
              </div>
              <div>
                <dt className="text-sm font-bold text-field-600">Remaining</dt>
                <dd>
                  <RemainingFigure row={row} />
                </dd>
              </div>
              <div className="col-span-2">
                <dt className="text-sm font-bold text-field-600">Projected</dt>
                <dd>
                  <ProjectedFigure row={row} />
                </dd>
              </div>
            </dl>
          </div>
        </li>
      ))}
    </ul>
  );
}
