import type { MeterReplacement, Reading, Usage } from '../api/types';
import { DUE_LINE_COLOURS } from './meter-chart-colours';

// The meter chart's series. Every figure comes from the server: the readings' lifetime values,
// and the usage estimate (rate, low, high per day). The line ahead only extends the last reading
// by those rates, value + rate × days; nothing here estimates anything itself.

const DAY_MS = 86_400_000;
/** how far ahead the trend line and the band reach */
export const PROJECTION_DAYS = 90;
const PROJECTION_STEP_DAYS = 15;

export interface ChartPoint {
  t: number;
  /** lifetime meter value of a reading */
  meter?: number;
  /** the trend line ahead */
  trend?: number;
  /** low–high band ahead */
  band?: [number, number];
}

export interface DueLine {
  value: number;
  label: string;
  /** whether the chart prints this line's label (false where it would overlap another) */
  labelled?: boolean;
  /** which end of the line its label sits at: two lines close together label both ends */
  side?: 'left' | 'right';
  /** the line's own colour, the same beside its name in the list under the chart */
  colour?: string;
  /** how many unlabelled lines just above share this line's label spot */
  alsoHere?: number;
}

/** How far back the chart looks: a number of days, or the whole history. */
export type ChartWindow = 183 | 365 | 'all';

export interface MeterChartData {
  points: ChartPoint[];
  /** the first reading ever, for the summary; `first` is where the chart's window starts */
  firstReading: { t: number; value: number };
  first: { t: number; value: number };
  last: { t: number; value: number };
  projection: { t: number; value: number; low: number; high: number } | null;
  /** due meters inside the chart's range, one line per value */
  dueLines: DueLine[];
  /** due meters the chart does not reach */
  dueBeyond: DueLine[];
  replacements: { t: number; label: string }[];
  xDomain: [number, number];
  yDomain: [number, number];
  /** round values for the y axis, spanning yDomain */
  yTicks: number[];
}

/** Group tasks that fall due at the same meter value into one labelled line. */
function groupDueMeters(dues: { taskName: string; dueMeter: number }[]): DueLine[] {
  const byValue = new Map<number, string[]>();
  for (const due of dues)
    byValue.set(due.dueMeter, [...(byValue.get(due.dueMeter) ?? []), due.taskName]);
  return [...byValue.entries()]
    .sort(([a], [b]) => a - b)
    .map(([value, names]) => ({ value, label: names.join(', ') }));
}

/**
 * Labels of lines closer together than `minGap` (meter units) would print over each other. Each
 * line gets its own colour; a label goes at the left end of its line, or at the right end when
 * the left is taken by a line just below; a line with both ends taken stays unlabelled, and the
 * nearest label below says how many more share its spot (the list under the chart names them).
 */
function placeLabels(lines: DueLine[], minGap: number): DueLine[] {
  const placed: DueLine[] = [];
  const lastOn: Record<'left' | 'right', number | null> = { left: null, right: null };
  lines.forEach((line, i) => {
    const colour = DUE_LINE_COLOURS[i % DUE_LINE_COLOURS.length];
    const free = (side: 'left' | 'right') => {
      const last = lastOn[side];
      return last === null || line.value - placed[last].value >= minGap;
    };
    const side = free('left') ? 'left' : free('right') ? 'right' : null;
    if (side) {
      lastOn[side] = placed.length;
      placed.push({ ...line, labelled: true, side, colour, alsoHere: 0 });
      return;
    }
    const anchor = Math.max(lastOn.left ?? -1, lastOn.right ?? -1);
    placed[anchor] = { ...placed[anchor], alsoHere: (placed[anchor].alsoHere ?? 0) + 1 };
    placed.push({ ...line, labelled: false, colour });
  });
  return placed;
}

/** Label height over plot height: the share of the y range one label needs. */
const LABEL_SHARE = 18 / 220;

export function buildMeterChartData(
  readingsNewestFirst: Reading[],
  replacements: MeterReplacement[],
  usage: Usage | null,
  dues: { taskName: string; dueMeter: number }[],
  period: ChartWindow = 'all',
): MeterChartData | null {
  if (readingsNewestFirst.length === 0) return null;
  const all: ChartPoint[] = readingsNewestFirst
    .map((r) => ({ t: new Date(r.takenAt).getTime(), meter: r.lifetimeValue }))
    .reverse();
  const lastT = all[all.length - 1].t;
  const since = period === 'all' ? -Infinity : lastT - period * DAY_MS;
  // keep one reading before the window so the line enters from the left edge; at least two points
  const startIndex = Math.max(
    0,
    Math.min(
      all.findIndex((p) => p.t >= since),
      all.length - 2,
    ),
  );
  const points = all.slice(startIndex);
  const from = Math.max(points[0].t, since);
  const first = { t: from, value: interpolate(points, from) };
  const last = { t: points[points.length - 1].t, value: points[points.length - 1].meter! };

  let projection: MeterChartData['projection'] = null;
  if (usage && usage.method !== 'none') {
    const at = (days: number) => ({
      t: last.t + days * DAY_MS,
      value: last.value + usage.rate * days,
      low: last.value + usage.low * days,
      high: last.value + usage.high * days,
    });
    points[points.length - 1] = {
      ...points[points.length - 1],
      trend: last.value,
      band: [last.value, last.value],
    };
    for (let days = PROJECTION_STEP_DAYS; days <= PROJECTION_DAYS; days += PROJECTION_STEP_DAYS) {
      const p = at(days);
      points.push({ t: p.t, trend: p.value, band: [p.low, p.high] });
    }
    projection = at(PROJECTION_DAYS);
  }

  const top = projection ? projection.high : last.value;
  const span = Math.max(top - first.value, 1);
  // due meters a little above the band still read as "soon"; far-off ones would squash the chart
  const reach = top + span * 0.15;
  const grouped = groupDueMeters(dues);
  const inRange = grouped.filter((d) => d.value >= first.value && d.value <= reach);
  const dueBeyond = grouped.filter((d) => d.value > reach);

  const values = [first.value, top, ...inRange.map((d) => d.value)];
  const min = Math.min(...values);
  const max = Math.max(...values);
  // a flat line (one reading) gets room around it, so the axis ticks are not one value repeated
  const pad = max > min ? Math.max((max - min) * 0.05, 1) : Math.max(Math.abs(max) * 0.02, 10);
  const yTicks = niceTicks(Math.max(0, min - pad), max + pad, 5);
  const dueLines = placeLabels(inRange, (yTicks[yTicks.length - 1] - yTicks[0]) * LABEL_SHARE);

  return {
    points,
    firstReading: { t: all[0].t, value: all[0].meter! },
    first,
    last,
    projection,
    dueLines,
    dueBeyond,
    replacements: replacements
      .map((r) => ({
        t: new Date(r.replacedAt).getTime(),
        // a bale counter zeroed is the same counter, not a new meter (issue 13)
        label: r.kind === 'reset' ? 'Counter reset' : 'Meter replaced',
      }))
      .filter((r) => r.t >= first.t && r.t <= last.t),
    // a single reading and no estimate: the week around it, so the axis shows days, not hours
    xDomain: projection
      ? [first.t, projection.t]
      : last.t - first.t >= DAY_MS
        ? [first.t, last.t]
        : [last.t - 3 * DAY_MS, last.t + 3 * DAY_MS],
    yDomain: [yTicks[0], yTicks[yTicks.length - 1]],
    yTicks,
  };
}

/** The lifetime value at time t on the straight line between the readings around it. */
function interpolate(points: ChartPoint[], t: number): number {
  const after = points.findIndex((p) => p.t >= t);
  if (after <= 0) return points[Math.max(after, 0)].meter!;
  const a = points[after - 1];
  const b = points[after];
  return a.meter! + ((b.meter! - a.meter!) * (t - a.t)) / (b.t - a.t);
}

/** About `count` ticks on round steps (1, 2, 2.5 or 5 × 10ⁿ) covering [min, max]. */
export function niceTicks(min: number, max: number, count: number): number[] {
  const raw = Math.max(max - min, 1) / Math.max(count - 1, 1);
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((f) => f * magnitude).find((s) => s >= raw) ?? raw;
  const start = Math.floor(min / step) * step;
  const ticks: number[] = [];
  for (let v = start; v < max + step; v += step) {
    ticks.push(Number(v.toFixed(6)));
    if (v >= max) break;
  }
  return ticks;
}
