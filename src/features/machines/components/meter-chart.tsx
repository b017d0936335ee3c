import { useMemo, useState } from 'react';
import { formatDistanceStrict } from 'date-fns';
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
} from 'recharts';
import { formatMeter, meterUnitLabel } from '../../../lib/fleet-format';
import { formatDate } from '../../../lib/format';
import type { MeterReplacement, Reading, Usage } from '../api/types';
import { BAND, DUE, INK, REPLACED, TREND } from '../lib/meter-chart-colours';
import { buildMeterChartData, PROJECTION_DAYS, type ChartWindow } from '../lib/meter-chart-data';
import { middayOf, timeTicks } from '../lib/meter-chart-time';
import { useMediaQuery } from '../lib/use-media-query';
import { ChartSummaryTable, DueMeterList, type ServiceMark } from './meter-chart-figures';
import { ChartLegend, ChartTooltip, ServiceSquare, WindowPicker } from './meter-chart-parts';

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
  // wide enough for the longest value ("18,000"): about 8 px a character at 13 px, and the tick
  const axisWidth = Math.max(...data.yTicks.map((v) => compactNumber.format(v).length)) * 8 + 12;
  const caption =
    data.last.t > data.firstReading.t
      ? `Meter from ${formatMeter(data.firstReading.value, unit)} to ${formatMeter(
          data.last.value,
          unit,
        )} over ${formatDistanceStrict(data.firstReading.t, data.last.t)}`
      : `One reading so far: ${formatMeter(data.last.value, unit)} on ${formatDate(
          new Date(data.last.t).toISOString(),
          timeZone,
        )}`;

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
      <div aria-hidden="true" className="flex h-72 w-full flex-col sm:h-80">
        {/* the value axis's unit, over it */}
        <p className="text-sm font-bold text-field-700">{meterUnitLabel(unit)}</p>
        <ResponsiveContainer width="100%" className="min-h-0 flex-1">
          <ComposedChart
            data={data.points}
            margin={{ top: 12, right: narrow ? 8 : 24, bottom: 4, left: 0 }}
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
              width={axisWidth}
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
                stroke={line.colour ?? DUE}
                strokeDasharray="2 3"
                strokeWidth={1.5}
                label={{
                  value: line.labelled
                    ? shortLabel(line.label, narrow ? 18 : 48) +
                      (line.alsoHere ? ` +${line.alsoHere}` : '')
                    : '',
                  position: line.side === 'right' ? 'insideTopRight' : 'insideTopLeft',
                  fill: line.colour ?? DUE,
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
        replacementLabels={[...new Set(data.replacements.map((r) => r.label))]}
        hasServices={marks.length > 0}
      />
      <DueMeterList dueLines={data.dueLines} dueBeyond={data.dueBeyond} unit={unit} />
      <ChartSummaryTable data={data} marks={marks} unit={unit} timeZone={timeZone} />
    </figure>
  );
}

const compactNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });
const NO_SERVICES: ServiceMark[] = [];
