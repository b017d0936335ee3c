import type { TooltipContentProps } from 'recharts';
import type { NameType, ValueType } from 'recharts/types/component/DefaultTooltipContent';
import { formatDate } from '../../../lib/format';
import { formatMeter } from '../../../lib/fleet-format';
import { BAND, DUE, INK, REPLACED, SERVICE, TREND } from '../lib/meter-chart-colours';
import type { ChartPoint, ChartWindow } from '../lib/meter-chart-data';

// The meter chart's pieces around the drawing: the period picker, the tooltip, the legend and
// the square of a service mark.

/** A completed service on the line: a white square, told apart from the dots by its shape. */
export function ServiceSquare({ cx, cy }: { cx?: number; cy?: number }) {
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

const WINDOWS: { value: ChartWindow; label: string }[] = [
  { value: 183, label: '6 months' },
  { value: 365, label: '1 year' },
  { value: 'all', label: 'All' },
];

/** How much history the chart shows; the trend ahead is always the next 90 days. */
export function WindowPicker({
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

/** The figures of the point under the pointer: the reading, or the trend and range ahead. */
export function ChartTooltip({
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

/** What each line and mark is; hidden from screen readers, who get the table instead. */
export function ChartLegend({
  hasProjection,
  replacementLabels,
  hasServices,
}: {
  hasProjection: boolean;
  /** the kinds of meter change on the chart: "Meter replaced", "Counter reset" */
  replacementLabels: string[];
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
      {replacementLabels.map((label) => (
        <li key={label} className={item}>
          <svg width="8" height="14">
            <line x1="4" y1="0" x2="4" y2="14" stroke={REPLACED} strokeWidth="2" />
          </svg>
          {label}
        </li>
      ))}
    </ul>
  );
}
