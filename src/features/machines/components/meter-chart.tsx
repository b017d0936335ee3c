import { useMemo, useState } from 'react';
import { TZDate } from '@date-fns/tz';
import { addMonths, formatDistanceStrict, startOfMonth } from 'date-fns';
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
  type TooltipContentProps,
} from 'recharts';
import type { NameType, ValueType } from 'recharts/types/component/DefaultTooltipContent';
import { formatDate } from '../../../lib/format';
import { formatMeter } from '../../../lib/fleet-format';
import type { MeterReplacement, Reading, Usage } from '../api/types';
import {
  buildMeterChartData,
  PROJECTION_DAYS,
  type ChartPoint,
  type ChartWindow,
} from '../lib/meter-chart-data';
import { useMediaQuery } from '../lib/use-media-query';

// Colours from the palette (tailwind.config.ts); each series also differs by line style, and the
// legend below names them, so colour is never the only difference.
const INK = '#2b3a31'; // field-800
const TREND = '#92633d'; // loam-500
const BAND = '#f4da8a'; // straw-200
const DUE = '#a92c1c'; // poppy-600
const REPLACED = '#235f8e'; // sky-600
const SERVICE = '#235f8e'; // sky-600, drawn as a square

/** A completed service visit: the day it was done and the lifetime meter at service. */
export interface ServiceMark {
  performedOn: string;
  meter: number;
  label: string;
}

interface MeterChartProps {
  readings: Reading[];
  replacements: MeterReplacement[];
  usage: Usage | null;
  dues: { taskName: string; dueMeter: number }[];
  /** completed service visits, shown as marks on the line */
  services?: ServiceMark[];
  unit: string;
  timeZone: string;
}

const monthYear = (timeZone: string) =>
  new Intl.DateTimeFormat(undefined, { month: 'short', year: 'numeric', timeZone });

const shortLabel = (text: string, max: number) =>
  text.length > max ? `${text.slice(0, max - 1)}…` : text;

/** Lifetime meter over time, the trend ahead with its low–high band, and the due meters. */
export function MeterChart({
  readings,
  replacements,
  usage,
  dues,
  services = NO_SERVICES,
  unit,
  timeZone,
}: MeterChartProps) {
  const narrow = !useMediaQuery('(min-width: 640px)');
  const [period, setPeriod] = useState<ChartWindow>(365);
  const data = useMemo(
    () => buildMeterChartData(readings, replacements, usage, dues, period),
    [readings, replacements, usage, dues, period],
  );
  const marks = useMemo(
    () =>
      data
        ? services
            .map((s) => ({ ...s, t: middayOf(s.performedOn, timeZone) }))
            .filter((s) => s.t >= data.xDomain[0] && s.t <= data.xDomain[1])
        : [],
    [services, data, timeZone],
  );
  if (!data) return null;
  const historyDays = (data.last.t - data.firstReading.t) / 86_400_000;

  const xTicks = timeTicks(data.xDomain, narrow ? 3 : 6, timeZone);
  const caption = `Meter from ${formatMeter(data.firstReading.value, unit)} to ${formatMeter(
    data.last.value,
    unit,
  )} over ${formatDistanceStrict(data.firstReading.t, data.last.t)}`;

  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="font-bold text-field-900">
        {caption}
        {data.projection ? (
          <span className="block font-normal text-field-700">
            At the estimated rate the meter reads about {formatMeter(data.projection.value, unit)} (
            {formatMeter(data.projection.low, unit)}–{formatMeter(data.projection.high, unit)}) in{' '}
            {PROJECTION_DAYS} days.
          </span>
        ) : (
          <span className="block font-normal text-field-700">
            No projection yet: the usage estimate needs more readings.
          </span>
        )}
      </figcaption>
      {historyDays > 183 ? (
        <WindowPicker value={period} onChange={setPeriod} showYear={historyDays > 365} />
      ) : null}
      <div aria-hidden="true" className="h-72 w-full sm:h-80">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart
            data={data.points}
            margin={{ top: 12, right: narrow ? 8 : 24, bottom: 4, left: narrow ? -8 : 8 }}
            accessibilityLayer={false}
          >
            <CartesianGrid stroke="#e3e8e2" vertical={false} />
            <XAxis
              dataKey="t"
              type="number"
              scale="time"
              domain={data.xDomain}
              ticks={xTicks.ticks}
              tickFormatter={xTicks.format}
              tick={{ fill: '#4a5b4d', fontSize: 13 }}
              stroke="#a3b2a3"
            />
            <YAxis
              type="number"
              domain={data.yDomain}
              allowDataOverflow
              ticks={data.yTicks}
              tickFormatter={(v: number) => compactNumber.format(v)}
              tick={{ fill: '#4a5b4d', fontSize: 13 }}
              stroke="#a3b2a3"
              width={narrow ? 48 : 60}
            />
            <Tooltip
              content={(props) => <ChartTooltip {...props} unit={unit} timeZone={timeZone} />}
            />
            <Area
              dataKey="band"
              stroke="none"
              fill={BAND}
              fillOpacity={0.7}
              isAnimationActive={false}
              connectNulls
            />
            <Line
              dataKey="meter"
              stroke={INK}
              strokeWidth={2.5}
              dot={false}
              isAnimationActive={false}
              connectNulls
            />
            <Line
              dataKey="trend"
              stroke={TREND}
              strokeWidth={2.5}
              strokeDasharray="6 4"
              dot={false}
              isAnimationActive={false}
              connectNulls
            />
            {data.dueLines.map((line) => (
              <ReferenceLine
                key={line.value}
                y={line.value}
                stroke={DUE}
                strokeDasharray="2 3"
                strokeWidth={1.5}
                label={{
                  value: line.labelled
                    ? shortLabel(line.label, narrow ? 24 : 60) +
                      (line.alsoHere ? ` +${line.alsoHere}` : '')
                    : '',
                  position: 'insideTopLeft',
                  fill: DUE,
                  fontSize: 12,
                  fontWeight: 700,
                }}
              />
            ))}
            {marks.map((m, i) => (
              <ReferenceDot
                key={i}
                x={m.t}
                y={m.meter}
                shape={(props) => <ServiceSquare cx={props.cx} cy={props.cy} />}
              />
            ))}
            {data.replacements.map((r) => (
              <ReferenceLine
                key={r.t}
                x={r.t}
                stroke={REPLACED}
                strokeWidth={2}
                label={{
                  value: r.label,
                  position: 'insideTopRight',
                  fill: REPLACED,
                  fontSize: 12,
                  fontWeight: 700,
                }}
              />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ChartLegend
        hasProjection={Boolean(data.projection)}
        hasReplacement={data.replacements.length > 0}
        hasServices={marks.length > 0}
      />
      {data.dueLines.length > 0 || data.dueBeyond.length > 0 ? (
        <ul className="flex flex-col gap-1 text-sm text-field-800">
          {data.dueLines.map((line) => (
            <li key={line.value}>
              <span className="font-bold text-poppy-700">
                Due at {formatMeter(line.value, unit)}
              </span>
              : {line.label}
            </li>
          ))}
          {data.dueBeyond.length > 0 ? (
            <li>
              <details>
                <summary className="cursor-pointer py-1 text-field-700">
                  {data.dueBeyond.length} more due{' '}
                  {data.dueBeyond.length === 1 ? 'meter' : 'meters'} above the chart
                </summary>
                <ul className="mt-1 flex flex-col gap-1 pl-4 text-field-600">
                  {data.dueBeyond.map((line) => (
                    <li key={line.value}>
                      Due at {formatMeter(line.value, unit)}: {line.label}
                    </li>
                  ))}
                </ul>
              </details>
            </li>
          ) : null}
        </ul>
      ) : null}
      <ChartSummaryTable data={data} marks={marks} unit={unit} timeZone={timeZone} />
    </figure>
  );
}

const compactNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });
const NO_SERVICES: ServiceMark[] = [];

/** Midday of a farm-local date (yyyy-mm-dd), as an instant: where a day's service sits on the time axis. */
function middayOf(isoDate: string, timeZone: string): number {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new TZDate(y, m - 1, d, 12, 0, timeZone).getTime();
}

function ServiceSquare({ cx, cy }: { cx?: number; cy?: number }) {
  if (cx === undefined || cy === undefined) return <g />;
  return (
    <rect
      x={cx - 5}
      y={cy - 5}
      width={10}
      height={10}
      fill="white"
      stroke={SERVICE}
      strokeWidth={2.5}
    />
  );
}

/**
 * Ticks on the first of a month in the farm's time zone, at most `max` of them; a span shorter
 * than two months gets evenly spaced day ticks instead.
 */
function timeTicks(
  [from, to]: [number, number],
  max: number,
  timeZone: string,
): { ticks: number[]; format: (t: number) => string } {
  const months: number[] = [];
  for (
    let month = addMonths(startOfMonth(new TZDate(from, timeZone)), 1);
    month.getTime() <= to;
    month = addMonths(month, 1)
  )
    months.push(month.getTime());
  if (months.length >= 2) {
    const step = Math.ceil(months.length / max);
    const label = monthYear(timeZone);
    return { ticks: months.filter((_, i) => i % step === 0), format: (t) => label.format(t) };
  }
  const label = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', timeZone });
  const stepMs = (to - from) / (max - 1);
  return {
    ticks: Array.from({ length: max }, (_, i) => Math.round(from + i * stepMs)),
    format: (t) => label.format(t),
  };
}

const WINDOWS: { value: ChartWindow; label: string }[] = [
  { value: 183, label: '6 months' },
  { value: 365, label: '1 year' },
  { value: 'all', label: 'All' },
];

/** How much history the chart shows; the trend ahead is always the next 90 days. */
function WindowPicker({
  value,
  onChange,
  showYear,
}: {
  value: ChartWindow;
  onChange: (next: ChartWindow) => void;
  showYear: boolean;
}) {
  return (
    <div role="group" aria-label="Chart period" className="flex flex-wrap gap-2">
      {WINDOWS.filter((w) => showYear || w.value !== 365).map((w) => (
        <button
          key={w.label}
          type="button"
          aria-pressed={value === w.value}
          onClick={() => onChange(w.value)}
          className={
            value === w.value
              ? 'min-h-touch rounded-full bg-field-800 px-4 font-bold text-oat-50'
              : 'min-h-touch rounded-full border border-field-300 bg-white px-4 font-bold text-field-800 hover:bg-field-50'
          }
        >
          {w.label}
        </button>
      ))}
    </div>
  );
}

function ChartTooltip({
  active,
  payload,
  unit,
  timeZone,
}: TooltipContentProps<ValueType, NameType> & { unit: string; timeZone: string }) {
  if (!active || !payload?.length) return null;
  const point = payload[0].payload as ChartPoint;
  return (
    <div className="rounded-lg border border-field-200 bg-white px-3 py-2 text-sm shadow-card">
      <p className="font-bold">{formatDate(new Date(point.t).toISOString(), timeZone)}</p>
      {point.meter !== undefined ? <p>Meter {formatMeter(point.meter, unit)}</p> : null}
      {point.meter === undefined && point.trend !== undefined ? (
        <p>Trend {formatMeter(point.trend, unit)}</p>
      ) : null}
      {point.meter === undefined && point.band ? (
        <p>
          Range {formatMeter(point.band[0], unit)}–{formatMeter(point.band[1], unit)}
        </p>
      ) : null}
    </div>
  );
}

function ChartLegend({
  hasProjection,
  hasReplacement,
  hasServices,
}: {
  hasProjection: boolean;
  hasReplacement: boolean;
  hasServices: boolean;
}) {
  const item = 'flex items-center gap-2';
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-field-700" aria-hidden="true">
      <li className={item}>
        <svg width="24" height="8">
          <line x1="0" y1="4" x2="24" y2="4" stroke={INK} strokeWidth="3" />
        </svg>
        Readings (lifetime)
      </li>
      {hasProjection ? (
        <>
          <li className={item}>
            <svg width="24" height="8">
              <line
                x1="0"
                y1="4"
                x2="24"
                y2="4"
                stroke={TREND}
                strokeWidth="3"
                strokeDasharray="6 4"
              />
            </svg>
            Trend ahead
          </li>
          <li className={item}>
            <span className="inline-block h-3 w-6 rounded-sm" style={{ background: BAND }} />
            Low–high range
          </li>
        </>
      ) : null}
      <li className={item}>
        <svg width="24" height="8">
          <line x1="0" y1="4" x2="24" y2="4" stroke={DUE} strokeWidth="2" strokeDasharray="2 3" />
        </svg>
        Due meter
      </li>
      {hasServices ? (
        <li className={item}>
          <svg width="14" height="14">
            <rect
              x="2"
              y="2"
              width="10"
              height="10"
              fill="white"
              stroke={SERVICE}
              strokeWidth="2.5"
            />
          </svg>
          Service done
        </li>
      ) : null}
      {hasReplacement ? (
        <li className={item}>
          <svg width="8" height="14">
            <line x1="4" y1="0" x2="4" y2="14" stroke={REPLACED} strokeWidth="2" />
          </svg>
          Meter replaced
        </li>
      ) : null}
    </ul>
  );
}

/** The chart's figures as a table, for screen readers (the drawing itself is hidden from them). */
function ChartSummaryTable({
  data,
  marks,
  unit,
  timeZone,
}: {
  data: NonNullable<ReturnType<typeof buildMeterChartData>>;
  marks: (ServiceMark & { t: number })[];
  unit: string;
  timeZone: string;
}) {
  const date = (t: number) => formatDate(new Date(t).toISOString(), timeZone);
  return (
    <table className="sr-only">
      <caption>Meter chart figures</caption>
      <thead>
        <tr>
          <th scope="col">Point</th>
          <th scope="col">Date</th>
          <th scope="col">Meter</th>
        </tr>
      </thead>
      <tbody>
        <tr>
          <th scope="row">First reading</th>
          <td>{date(data.first.t)}</td>
          <td>{formatMeter(data.first.value, unit)}</td>
        </tr>
        <tr>
          <th scope="row">Last reading</th>
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
            <th scope="row">Service: {m.label}</th>
            <td>{date(m.t)}</td>
            <td>{formatMeter(m.meter, unit)}</td>
          </tr>
        ))}
        {data.replacements.map((r) => (
          <tr key={r.t}>
            <th scope="row">Meter replaced</th>
            <td>{date(r.t)}</td>
            <td>—</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
