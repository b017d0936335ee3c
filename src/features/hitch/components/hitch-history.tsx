import { TableScroll } from '../../../components/ui/table-scroll';
import { formatMeter } from '../../../lib/fleet-format';
import { formatDateTime } from '../../../lib/format';
import type { HitchSpan } from '../api/get-hitch-log';

const until = (s: HitchSpan, timeZone: string) =>
  s.endedAt ? formatDateTime(s.endedAt, timeZone) : 'Still hitched';

/**
 * The spans of the hitch log, newest first: a card each on a phone (a 390 px screen shows every
 * figure without sideways scroll), a table from the small breakpoint up.
 */
export function HitchHistory({ spans, timeZone }: { spans: HitchSpan[]; timeZone: string }) {
  return (
    <>
      <ul aria-label="Hitch history" className="flex flex-col gap-2 sm:hidden">
        {spans.map((s) => (
          <li key={s.id} className="rounded-lg border border-field-200 bg-white p-3 shadow-card">
            <p className="flex flex-wrap justify-between gap-x-3 font-semibold">
              <span>
                {s.implement.fleetNumber} on {s.tractor.fleetNumber}
              </span>
              <span>{formatMeter(s.hours, 'h')}</span>
            </p>
            <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm text-field-700">
              <dt>Hitched</dt>
              <dd>{formatDateTime(s.startedAt, timeZone)}</dd>
              <dt>Unhitched</dt>
              <dd>{until(s, timeZone)}</dd>
            </dl>
          </li>
        ))}
      </ul>
      <TableScroll label="Hitch history" className="hidden sm:block">
        <table className="w-full text-left">
          <caption className="sr-only">Hitch history</caption>
          <thead className="bg-field-50 text-sm text-field-700">
            <tr>
              <th className="px-3 py-2">Implement</th>
              <th className="px-3 py-2">Tractor</th>
              <th className="px-3 py-2">Hitched</th>
              <th className="px-3 py-2">Unhitched</th>
              <th className="px-3 py-2 text-right">Hours</th>
            </tr>
          </thead>
          <tbody>
            {spans.map((s) => (
              <tr key={s.id} className="border-t border-field-100">
                <td className="px-3 py-2">{s.implement.fleetNumber}</td>
                <td className="px-3 py-2">{s.tractor.fleetNumber}</td>
                <td className="px-3 py-2">{formatDateTime(s.startedAt, timeZone)}</td>
                <td className="px-3 py-2">{until(s, timeZone)}</td>
                <td className="px-3 py-2 text-right">{formatMeter(s.hours, 'h')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
    </>
  );
}
