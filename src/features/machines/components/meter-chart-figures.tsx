import { formatDate } from '../../../lib/format';
import { formatMeter } from '../../../lib/fleet-format';
import { DUE } from '../lib/meter-chart-colours';
import { PROJECTION_DAYS, type DueLine, type MeterChartData } from '../lib/meter-chart-data';

// The meter chart's figures in words: the due meters under the drawing, and the table a screen
// reader reads in place of it.

/** A completed service visit: the day it was done and the lifetime meter at service. */
export interface ServiceMark {
  performedOn: string;
  meter: number;
  label: string;
}

/** The due meters the chart draws, and those above its top folded away. */
export function DueMeterList({
  dueLines,
  dueBeyond,
  unit,
}: {
  dueLines: DueLine[];
  dueBeyond: DueLine[];
  unit: string;
}) {
  if (dueLines.length === 0 && dueBeyond.length === 0) return null;
  return (
    <ul className="flex flex-col gap-1 text-sm text-field-800">
      {dueLines.map((line) => (
        <li key={line.value} className="flex items-baseline gap-2">
          {/* the line's colour on the chart, beside its name */}
          <svg width="20" height="8" aria-hidden="true" className="shrink-0">
            <line
              x1="0"
              y1="4"
              x2="20"
              y2="4"
              stroke={line.colour ?? DUE}
              strokeWidth="3"
              strokeDasharray="2 3"
            />
          </svg>
          <span>
            <span className="font-bold" style={{ color: line.colour ?? DUE }}>
              Due at {formatMeter(line.value, unit)}
            </span>
            : {line.label}
          </span>
        </li>
      ))}
      {dueBeyond.length > 0 ? (
        <li>
          <details>
            <summary className="cursor-pointer py-1 text-field-700">
              {dueBeyond.length} more due {dueBeyond.length === 1 ? 'meter' : 'meters'} above the
              chart
            </summary>
            <ul className="mt-1 flex flex-col gap-1 pl-4 text-field-600">
              {dueBeyond.map((line) => (
                <li key={line.value}>
                  Due at {formatMeter(line.value, unit)}: {line.label}
                </li>
              ))}
            </ul>
          </details>
        </li>
      ) : null}
    </ul>
  );
}

/** The chart's figures as a table, for screen readers (the drawing itself is hidden from them). */
export function ChartSummaryTable({
  data,
  marks,
  unit,
  timeZone,
}: {
  data: MeterChartData;
  marks: (ServiceMark & { t: number })[];
  unit: string;
  timeZone: string;
}) {
  const date = (t: number) => formatDate(new Date(t).toISOString(), timeZone);
  return (
    // the wrapper is what hides it: a table ignores sr-only's 1 px width and overflow, and a
    // hidden table as wide as its figures widened the whole page on a phone
    <div className="sr-only">
      <table>
        <caption>Meter chart figures</caption>
        <thead>
          <tr>
            <th scope="col">Point</th>
            <th scope="col">Date</th>
            <th scope="col">Meter</th>
          </tr>
        </thead>
        <tbody>
          {data.last.t > data.first.t ? (
            <tr>
              <th scope="row">First reading</th>
              <td>{date(data.first.t)}</td>
              <td>{formatMeter(data.first.value, unit)}</td>
            </tr>
          ) : null}
          <tr>
            <th scope="row">{data.last.t > data.first.t ? 'Last reading' : 'Reading'}</th>
            <td>{date(data.last.t)}</td>
            <td>{formatMeter(data.last.value, unit)}</td>
          </tr>
          {data.projection ? (
            <tr>
              <th scope="row">Trend in {PROJECTION_DAYS} days</th>
              <td>{date(data.projection.t)}</td>
              <td>
                {formatMeter(data.projection.value, unit)} (range{' '}
                {formatMeter(data.projection.low, unit)}–{formatMeter(data.projection.high, unit)})
              </td>
            </tr>
          ) : null}
          {marks.map((m, i) => (
            <tr key={`service-${i}`}>
              <th scope="row">{m.label ? `Service: ${m.label}` : 'Service'}</th>
              <td>{date(m.t)}</td>
              <td>{formatMeter(m.meter, unit)}</td>
            </tr>
          ))}
          {data.replacements.map((r) => (
            <tr key={r.t}>
              <th scope="row">{r.label}</th>
              <td>{date(r.t)}</td>
              <td>—</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
