import { Link } from 'react-router-dom';
import { Caution } from '../../../components/ui/caution';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { BoardRow } from '../api/types';
import { DueAt, Projected, ReadingAge } from './board-cells';

interface BoardListProps {
  rows: BoardRow[];
  selected: ReadonlySet<string>;
  onToggle: (row: BoardRow, checked: boolean) => void;
  /** the advisor's page of the row's machine (its due tasks, readings and, with service, history) */
  machineHref: (row: BoardRow) => string;
}

const selectLabel = (r: BoardRow) =>
  `Select ${r.machine.fleetNumber} ${r.taskName} at ${r.customer.name}`;

/** The task's hazards named, their full caution a tap away, whenever it involves a hazard. */
function TaskCaution({ row }: { row: BoardRow }) {
  return row.hazards.length ? (
    <Caution variant="summary" heading="Caution." hazards={row.hazards} defer />
  ) : null;
}

// The table's columns need the content column of a 1280 px window (about 960 px beside the side
// bar); narrower windows get the cards, so no column is cut off.
const TABLE_FITS = '(min-width: 1280px)';

/** The board's rows in the server's order: a table where there is room, cards on phones. */
export function BoardList(props: BoardListProps) {
  const wide = useMediaQuery(TABLE_FITS);
  return wide ? <BoardTable {...props} /> : <BoardCards {...props} />;
}

const th = 'px-2.5 py-2 text-left text-sm font-bold text-field-700';
const td = 'px-2.5 py-3 align-top';

/** The row's machine, opening its page: a touch target of at least 44 px. */
function MachineLink({ row, href }: { row: BoardRow; href: string }) {
  return (
    <Link
      to={href}
      className="inline-flex min-h-touch items-center gap-1 underline decoration-field-300 underline-offset-4 hover:text-field-950 hover:decoration-field-700"
    >
      <span>
        <span className="font-bold">{row.machine.fleetNumber}</span>{' '}
        <span className="text-field-700">{row.machine.name}</span>
      </span>
    </Link>
  );
}

function Check({
  row,
  selected,
  onToggle,
}: { row: BoardRow } & Pick<BoardListProps, 'selected' | 'onToggle'>) {
  return (
    <input
      type="checkbox"
      className="size-6 accent-field-800"
      aria-label={selectLabel(row)}
      checked={selected.has(row.taskId)}
      onChange={(e) => onToggle(row, e.target.checked)}
    />
  );
}

function BoardTable({ rows, selected, onToggle, machineHref }: BoardListProps) {
  return (
    <div className="overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card">
      <table className="w-full border-collapse">
        <caption className="sr-only">Services coming due across customers</caption>
        <thead className="border-b border-field-200 bg-oat-100">
          <tr>
            <th scope="col" className={th}>
              <span className="sr-only">Select</span>
            </th>
            {['Status', 'Customer and machine', 'Task', 'Due at', 'Falls due', 'Last reading'].map(
              (h) => (
                <th key={h} scope="col" className={th}>
                  {h}
                </th>
              ),
            )}
          </tr>
        </thead>
        <tbody className="divide-y divide-field-100">
          {rows.map((row) => (
            <tr key={row.taskId} className={row.due.status === 'overdue' ? 'bg-poppy-50/40' : ''}>
              <td className={td}>
                <Check row={row} selected={selected} onToggle={onToggle} />
              </td>
              <td className={td}>
                <DueStatusBadge status={row.due.status} />
              </td>
              <td className={`${td} min-w-44`}>
                <span className="block text-sm font-bold text-loam-800">{row.customer.name}</span>
                <MachineLink row={row} href={machineHref(row)} />
              </td>
              <td className={td}>
                <div className="flex max-w-xs flex-col gap-1">
                  <span>{row.taskName}</span>
                  <TaskCaution row={row} />
                </div>
              </td>
              <td className={`${td} min-w-24`}>
                <DueAt row={row} />
              </td>
              <td className={`${td} min-w-36`}>
                <Projected row={row} />
              </td>
              <td className={`${td} min-w-28`}>
                <ReadingAge row={row} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function BoardCards({ rows, selected, onToggle, machineHref }: BoardListProps) {
  return (
    <ul aria-label="Services coming due across customers" className="flex flex-col gap-3">
      {rows.map((row) => (
        <li
          key={row.taskId}
          className={`rounded-xl border bg-white p-4 shadow-card ${
            row.due.status === 'overdue' ? 'border-poppy-300' : 'border-field-200'
          }`}
        >
          <div className="flex items-start gap-3">
            <Check row={row} selected={selected} onToggle={onToggle} />
            <div className="flex min-w-0 flex-1 flex-col gap-2">
              <div className="flex flex-wrap items-center gap-2">
                <DueStatusBadge status={row.due.status} />
                <span className="font-bold">{row.customer.name}</span>
              </div>
              <div>
                <MachineLink row={row} href={machineHref(row)} />
                <p>{row.taskName}</p>
                <TaskCaution row={row} />
              </div>
              <dl className="grid grid-cols-2 gap-x-4 gap-y-2 border-t border-field-100 pt-2">
                <div>
                  <dt className="text-sm font-bold text-field-600">Due at</dt>
                  <dd>
                    <DueAt row={row} />
                  </dd>
                </div>
                <div>
                  <dt className="text-sm font-bold text-field-600">Last reading</dt>
                  <dd>
                    <ReadingAge row={row} />
                  </dd>
                </div>
                <div className="col-span-2">
                  <dt className="text-sm font-bold text-field-600">Falls due</dt>
                  <dd>
                    <Projected row={row} />
                  </dd>
                </div>
              </dl>
            </div>
          </div>
        </li>
      ))}
    </ul>
  );
}
