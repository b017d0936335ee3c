import { cx } from '../../../components/ui/cx';
import { formatMeter } from '../../../lib/fleet-format';
import { formatDateTime } from '../../../lib/format';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { ImportPreviewRow } from '../api/types';
import { ImportStatus } from './import-status';

interface PreviewProps {
  rows: ImportPreviewRow[];
  timeZone: string;
}

/** Rows with errors first (so they are fixed first), then the file's order. */
export const errorsFirst = (rows: ImportPreviewRow[]) =>
  [...rows].sort(
    (a, b) => Number(b.status === 'error') - Number(a.status === 'error') || a.line - b.line,
  );

const takenAtText = (row: ImportPreviewRow, timeZone: string) =>
  row.takenAt ? formatDateTime(row.takenAt, timeZone) : '—';

const valueText = (row: ImportPreviewRow) =>
  row.value === null
    ? '—'
    : row.machine
      ? formatMeter(row.value, row.machine.meterUnit)
      : String(row.value);

/** Every row of the checked file: a table on wider screens, cards on phones. */
export function ImportPreviewTable({ rows, timeZone }: PreviewProps) {
  const wide = useMediaQuery('(min-width: 640px)');
  const ordered = errorsFirst(rows);
  return wide ? (
    <PreviewTable rows={ordered} timeZone={timeZone} />
  ) : (
    <PreviewCards rows={ordered} timeZone={timeZone} />
  );
}

const th = 'px-3 py-2 text-left text-sm font-bold text-field-700';
const td = 'px-3 py-2.5 align-top';

function PreviewTable({ rows, timeZone }: PreviewProps) {
  return (
    <div className="overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card">
      <table className="w-full border-collapse">
        <caption className="sr-only">Rows of the file</caption>
        <thead className="border-b border-field-200 bg-oat-100">
          <tr>
            {['Line', 'Fleet number', 'Machine', 'Taken at', 'Value', 'Status'].map((name) => (
              <th key={name} scope="col" className={th}>
                {name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-field-100">
          {rows.map((row) => (
            <tr key={row.line} className={cx(row.status === 'error' && 'bg-poppy-50')}>
              <td className={`${td} tabular-nums`}>{row.line}</td>
              <td className={`${td} font-bold`}>{row.fleetNumber || '—'}</td>
              <td className={td}>{row.machine?.name ?? '—'}</td>
              <td className={`${td} whitespace-nowrap`}>{takenAtText(row, timeZone)}</td>
              <td className={`${td} whitespace-nowrap tabular-nums`}>{valueText(row)}</td>
              <td className={`${td} min-w-40`}>
                <ImportStatus row={row} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function PreviewCards({ rows, timeZone }: PreviewProps) {
  return (
    <ul aria-label="Rows of the file" className="flex flex-col gap-2">
      {rows.map((row) => (
        <li
          key={row.line}
          className={cx(
            'flex flex-col gap-1 rounded-xl border bg-white p-3',
            row.status === 'error' ? 'border-2 border-poppy-300 bg-poppy-50' : 'border-field-200',
          )}
        >
          <div className="flex items-center justify-between gap-2">
            <span className="text-sm text-field-600">Line {row.line}</span>
            <ImportStatus row={{ ...row, error: null }} />
          </div>
          <p>
            <span className="font-bold">{row.fleetNumber || '—'}</span>{' '}
            {row.machine ? <span className="text-field-700">{row.machine.name}</span> : null}
          </p>
          {row.takenAt || row.value !== null ? (
            <p className="text-field-800">
              {takenAtText(row, timeZone)} · {valueText(row)}
            </p>
          ) : null}
          {row.error ? <p className="text-sm font-bold text-poppy-800">{row.error}</p> : null}
        </li>
      ))}
    </ul>
  );
}
