import { Badge } from '../../../components/ui/badge';
import { cx } from '../../../components/ui/cx';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { FleetImportRow } from '../../../../shared/schemas/fleet-import';

const OUTCOME = {
  create: { tone: 'ok', icon: 'plus', label: 'New machine' },
  update: { tone: 'info', icon: 'check', label: 'Update' },
  unchanged: { tone: 'neutral', icon: 'info', label: 'No change' },
  error: { tone: 'overdue', icon: 'error', label: 'Error' },
} as const;

/** A row's outcome as words and an icon, never colour alone. */
export function FleetOutcome({ row }: { row: FleetImportRow }) {
  const { tone, icon, label } = OUTCOME[row.outcome];
  return (
    <Badge tone={tone} icon={icon}>
      {label}
    </Badge>
  );
}

/** Rows with errors first (so they are fixed first), then the file's order. */
const errorsFirst = (rows: FleetImportRow[]) =>
  [...rows].sort(
    (a, b) => Number(b.outcome === 'error') - Number(a.outcome === 'error') || a.line - b.line,
  );

function Details({ row }: { row: FleetImportRow }) {
  if (row.errors.length)
    return (
      <ul className="flex flex-col gap-0.5 text-sm font-bold text-poppy-800">
        {row.errors.map((e) => (
          <li key={e}>{e}</li>
        ))}
      </ul>
    );
  if (!row.changes.length)
    return <span className="text-sm text-field-600">Already as in the file</span>;
  return <span className="text-sm text-field-800">{row.changes.join(' · ')}</span>;
}

/** Every row of the checked file and what importing it does: a table, or cards on phones. */
export function FleetPreviewTable({ rows }: { rows: FleetImportRow[] }) {
  const wide = useMediaQuery('(min-width: 640px)');
  return wide ? <Table rows={errorsFirst(rows)} /> : <Cards rows={errorsFirst(rows)} />;
}

function Cards({ rows }: { rows: FleetImportRow[] }) {
  return (
    <ul aria-label="Rows of the fleet file" className="flex flex-col gap-2">
      {rows.map((row) => (
        <li
          key={row.line}
          className={cx(
            'flex flex-col gap-1 rounded-xl border bg-white p-3',
            row.outcome === 'error' ? 'border-2 border-poppy-300 bg-poppy-50' : 'border-field-200',
          )}
        >
          <div className="flex items-center justify-between gap-2">
            <span className="text-sm text-field-600">Line {row.line}</span>
            <FleetOutcome row={row} />
          </div>
          <p>
            <span className="font-bold">{row.fleetNumber || '—'}</span>{' '}
            {row.name ? <span className="text-field-700">{row.name}</span> : null}
          </p>
          <Details row={row} />
        </li>
      ))}
    </ul>
  );
}

function Table({ rows }: { rows: FleetImportRow[] }) {
  return (
    <div className="overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card">
      <table className="w-full border-collapse">
        <caption className="sr-only">Rows of the fleet file</caption>
        <thead className="border-b border-field-200 bg-oat-100">
          <tr>
            {['Line', 'Fleet number', 'Name', 'Outcome', 'What changes'].map((name) => (
              <th
                key={name}
                scope="col"
                className="px-3 py-2 text-left text-sm font-bold text-field-700"
              >
                {name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-field-100">
          {rows.map((row) => (
            <tr key={row.line} className={cx(row.outcome === 'error' && 'bg-poppy-50')}>
              <td className="px-3 py-2.5 align-top tabular-nums">{row.line}</td>
              <td className="px-3 py-2.5 align-top font-bold whitespace-nowrap">
                {row.fleetNumber || '—'}
              </td>
              <td className="px-3 py-2.5 align-top">{row.name ?? '—'}</td>
              <td className="px-3 py-2.5 align-top">
                <FleetOutcome row={row} />
              </td>
              <td className="min-w-48 px-3 py-2.5 align-top">
                <Details row={row} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
