// The 'season' usage method: last year's same weeks, scaled to this year's recent use.
// See usage.ts for the method as a whole.
import type { ReadingPoint, UsageEstimate } from './types';

/** Days in the seasonal period (a year, days). */
export const SEASON_PERIOD_DAYS = 365;
/** Days of this year's recent use compared with the same days a year earlier. */
export const SEASON_COMPARE_DAYS = 28;
/** History needed before asOf for the season method: a year plus 30 days. */
export const SEASON_MIN_HISTORY_DAYS = SEASON_PERIOD_DAYS + 30;
/** Limits of the this-year-vs-last-year scale factor (dimensionless). */
export const SEASON_SCALE_LIMITS = { min: 0.5, max: 2 } as const;

const RATE_DAYS = 30;

/**
 * Whether readings sorted by day support the season method as of a day number: the first reading
 * lies 395+ days before asOf, and the readings cover the 28 days a year before the last reading
 * (without them the scale would compare against nothing).
 */
export function seasonApplies(sorted: ReadingPoint[], asOfDay: number): boolean {
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  return (
    asOfDay - first.day >= SEASON_MIN_HISTORY_DAYS &&
    last.day - first.day >= SEASON_PERIOD_DAYS + SEASON_COMPARE_DAYS
  );
}

/** Lifetime value at a day number, linear between readings sorted by day, flat outside them. */
export function lifetimeValueAt(sorted: ReadingPoint[], day: number): number {
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  if (day <= first.day) return first.value;
  if (day >= last.day) return last.value;
  let lo = 0;
  let hi = sorted.length - 1;
  // Invariant: sorted[lo].day <= day < sorted[hi].day.
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid].day <= day) lo = mid;
    else hi = mid;
  }
  const a = sorted[lo];
  const b = sorted[hi];
  return a.value + ((b.value - a.value) * (day - a.day)) / (b.day - a.day);
}

/**
 * The lifetime curve continued past the last reading by repeating the growth of one period
 * earlier: L(t) = last + L(t − 365) − L(lastDay − 365).
 */
function seasonalValueAt(sorted: ReadingPoint[], day: number): number {
  const last = sorted[sorted.length - 1];
  if (day <= last.day) return lifetimeValueAt(sorted, day);
  return (
    last.value +
    seasonalValueAt(sorted, day - SEASON_PERIOD_DAYS) -
    lifetimeValueAt(sorted, last.day - SEASON_PERIOD_DAYS)
  );
}

function mean(values: number[]): number {
  return values.length === 0 ? 0 : values.reduce((s, v) => s + v, 0) / values.length;
}

/** Season usage estimate (units per day) from readings sorted by day; horizonDays = profile length. */
export function estimateSeason(
  sorted: ReadingPoint[],
  asOfDay: number,
  horizonDays: number,
): UsageEstimate {
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  const at = (day: number) => lifetimeValueAt(sorted, day);

  // This year's last 28 days of readings against the same 28 days a year earlier, each side
  // padded with one average day so that idle against idle gives ×1 rather than 0/0.
  const averageDay = (last.value - first.value) / (last.day - first.day);
  const recent = at(last.day) - at(last.day - SEASON_COMPARE_DAYS);
  const yearBefore = last.day - SEASON_PERIOD_DAYS;
  const earlier = at(yearBefore) - at(yearBefore - SEASON_COMPARE_DAYS);
  const denominator = earlier + averageDay;
  const rawScale = denominator > 0 ? (recent + averageDay) / denominator : 1;
  const scale = Math.min(SEASON_SCALE_LIMITS.max, Math.max(SEASON_SCALE_LIMITS.min, rawScale));

  // Readings dated after asOf (later the same day) move the start to the last reading.
  const anchorDay = Math.max(asOfDay, last.day);
  const gap = seasonalValueAt(sorted, anchorDay) - last.value;
  const anchorValue = last.value + Math.max(0, gap) * scale;

  const base: number[] = [];
  const length = Math.max(1, Math.ceil(horizonDays));
  for (let i = 0; i < length; i += 1) {
    const start = anchorDay - SEASON_PERIOD_DAYS + i;
    base.push(Math.max(0, seasonalValueAt(sorted, start + 1) - seasonalValueAt(sorted, start)));
  }
  const profile = base.map((u) => u * scale);
  const baseRate = mean(base.slice(0, RATE_DAYS));

  return {
    method: 'season',
    rate: mean(profile.slice(0, RATE_DAYS)),
    low: baseRate * Math.min(scale, 1) * 0.8,
    high: baseRate * Math.max(scale, 1) * 1.2,
    readingCount: sorted.length,
    lastDay: last.day,
    lastValue: last.value,
    anchorDay,
    anchorValue,
    profile,
    scale,
    explanation: `Same weeks last year, scaled ×${scale.toFixed(2)} to this year's recent use`,
  };
}
