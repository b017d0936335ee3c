import { parseISO } from 'date-fns';
import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
  type TooltipContentProps,
} from 'recharts';
import type { NameType, ValueType } from 'recharts/types/component/DefaultTooltipContent';
import type { DotItemDotProps } from 'recharts/types/util/types';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { useMediaQuery } from '../../../lib/use-media-query';
import type { MeasurementPoint } from '../api/types';
import { roundTicks } from '../lib/chart-ticks';
import { formatQuantity, specRangeText } from '../lib/record-format';

// Palette colours (tailwind.config.ts). Out-of-spec visits differ by shape (a hollow diamond) as
// well as colour, and the caption and the table below say which they are.
const INK = '#2b3a31'; // field-800
const OUT = '#a92c1c'; // poppy-600
const SPEC = '#92633d'; // loam-500

interface ChartRow extends MeasurementPoint {
  t: number;
}

const monthYear = new Intl.DateTimeFormat(undefined, { month: 'short', year: 'numeric' });

/** One measurement over the visits, with the latest visit's spec limits as reference lines. */
export function MeasurementChart({
  name,
  points,
  meterUnit,
}: {
  name: string;
  points: MeasurementPoint[];
  meterUnit: string;
}) {
  const narrow = !useMediaQuery('(min-width: 640px)');
  if (points.length === 0) return <p className="text-field-600">No completed visit has it.</p>;
  const rows: ChartRow[] = points.map((p) => ({ ...p, t: parseISO(p.performedOn).getTime() }));
  const first = rows[0];
  const last = rows[rows.length - 1];
  const unit = last.unit;
  const spec = specRangeText(last.specMin, last.specMax, unit);
  const outCount = rows.filter((r) => r.inSpec === false).length;
  const value = (v: number) => `${formatQuantity(v)}${unit ? ` ${unit}` : ''}`;
  const limits = [last.specMin, last.specMax].filter((v): v is number => v !== null);
  const values = [...rows.map((r) => r.value), ...limits];
  const pad = Math.max((Math.max(...values) - Math.min(...values)) * 0.1, 0.1);
  const yTicks = roundTicks(Math.min(...values) - pad, Math.max(...values) + pad, 5);

  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="font-bold text-field-900">
        {name} over {rows.length} {rows.length === 1 ? 'visit' : 'visits'}: {value(first.value)} on{' '}
        {formatLocalDate(first.performedOn)}
        {rows.length > 1 ? `, ${value(last.value)} on ${formatLocalDate(last.performedOn)}` : ''}.
        <span className="block font-normal text-field-700">
          {spec ? `Spec ${spec}. ` : 'No spec given. '}
          {spec
            ? outCount
              ? `${outCount} of ${rows.length} outside the spec; the last one ${last.inSpec === false ? 'is outside' : 'is inside'} it.`
              : 'Every visit inside the spec.'
            : ''}
        </span>
      </figcaption>
      <div aria-hidden="true" className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart
            data={rows}
            margin={{ top: 16, right: narrow ? 8 : 24, bottom: 4, left: narrow ? -8 : 8 }}
            accessibilityLayer={false}
          >
            <CartesianGrid stroke="#e3e8e2" vertical={false} />
            <XAxis
              dataKey="t"
              type="number"
              scale="time"
              domain={['dataMin', 'dataMax']}
              padding={{ left: 16, right: 16 }}
              tickCount={narrow ? 3 : 6}
              tickFormatter={(t: number) => monthYear.format(t)}
              tick={{ fill: '#4a5b4d', fontSize: 13 }}
              stroke="#a3b2a3"
            />
            <YAxis
              type="number"
              domain={[yTicks[0], yTicks[yTicks.length - 1]]}
              ticks={yTicks}
              tickFormatter={(v: number) => formatQuantity(v)}
              tick={{ fill: '#4a5b4d', fontSize: 13 }}
              stroke="#a3b2a3"
              width={narrow ? 44 : 56}
            />
            <Tooltip content={(props) => <PointTooltip {...props} unit={unit} />} />
            {last.specMin !== null ? (
              <ReferenceLine
                y={last.specMin}
                stroke={SPEC}
                strokeDasharray="6 4"
                label={{
                  value: `Spec min ${value(last.specMin)}`,
                  position: 'insideBottomLeft',
                  fill: SPEC,
                  fontSize: 12,
                  fontWeight: 700,
                }}
              />
            ) : null}
            {last.specMax !== null ? (
              <ReferenceLine
                y={last.specMax}
                stroke={SPEC}
                strokeDasharray="6 4"
                label={{
                  value: `Spec max ${value(last.specMax)}`,
                  position: 'insideTopLeft',
                  fill: SPEC,
                  fontSize: 12,
                  fontWeight: 700,
                }}
              />
            ) : null}
            <Line
              dataKey="value"
              stroke={INK}
              strokeWidth={2.5}
              isAnimationActive={false}
              dot={(props: DotItemDotProps) => (
                <SpecDot
                  key={props.index}
                  cx={props.cx}
                  cy={props.cy}
                  payload={props.payload as ChartRow}
                />
              )}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-field-700" aria-hidden="true">
        <li className="flex items-center gap-2">
          <svg width="14" height="14">
            <circle cx="7" cy="7" r="5" fill={INK} />
          </svg>
          Inside the spec (or none given)
        </li>
        <li className="flex items-center gap-2">
          <svg width="14" height="14">
            <path d="M7 1 L13 7 L7 13 L1 7 Z" fill="white" stroke={OUT} strokeWidth="2.5" />
          </svg>
          Outside the spec
        </li>
        {limits.length ? (
          <li className="flex items-center gap-2">
            <svg width="24" height="8">
              <line
                x1="0"
                y1="4"
                x2="24"
                y2="4"
                stroke={SPEC}
                strokeWidth="2"
                strokeDasharray="6 4"
              />
            </svg>
            Spec limit
          </li>
        ) : null}
      </ul>
      {/* hidden by the wrapper: a table ignores sr-only's 1 px width and would widen the page */}
      <div className="sr-only">
        <table>
          <caption>{name} at each visit</caption>
          <thead>
            <tr>
              <th scope="col">Date</th>
              <th scope="col">Meter</th>
              <th scope="col">Value</th>
              <th scope="col">Spec</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={`${r.recordId}-${r.t}`}>
                <th scope="row">{formatLocalDate(r.performedOn)}</th>
                <td>{r.meterValue !== null ? formatMeter(r.meterValue, meterUnit) : '—'}</td>
                <td>{value(r.value)}</td>
                <td>{r.inSpec === null ? 'No spec' : r.inSpec ? 'In spec' : 'Outside the spec'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </figure>
  );
}

function SpecDot({ cx, cy, payload }: { cx?: number; cy?: number; payload?: ChartRow }) {
  if (cx === undefined || cy === undefined) return null;
  if (payload?.inSpec === false)
    return (
      <path
        d={`M${cx} ${cy - 7} L${cx + 7} ${cy} L${cx} ${cy + 7} L${cx - 7} ${cy} Z`}
        fill="white"
        stroke={OUT}
        strokeWidth={2.5}
      />
    );
  return <circle cx={cx} cy={cy} r={5} fill={INK} />;
}

function PointTooltip({
  active,
  payload,
  unit,
}: TooltipContentProps<ValueType, NameType> & { unit: string }) {
  if (!active || !payload?.length) return null;
  const row = payload[0].payload as ChartRow;
  return (
    <div className="rounded-lg border border-field-200 bg-white px-3 py-2 text-sm shadow-card">
      <p className="font-bold">{formatLocalDate(row.performedOn)}</p>
      <p>
        {formatQuantity(row.value)}
        {unit ? ` ${unit}` : ''} ·{' '}
        {row.inSpec === null ? 'no spec' : row.inSpec ? 'in spec' : 'outside the spec'}
      </p>
    </div>
  );
}
