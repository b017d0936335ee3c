// Usage rate of one machine, in meter units per day, from its lifetime readings.
//
// Method (quoted in the README):
// - Fewer than two readings, or readings spanning less than a day: no estimate ('none').
// - Trend (default): weighted least squares of lifetime value on day over the readings of the last
//   90 days, each weighted 2^(-age / 21 days), so recent weeks count most; fewer than two readings
//   in the window → the last two readings overall (a meter that has not moved means an idle
//   machine: rate 0). The range is the 20th–80th percentile of the rates between consecutive
//   readings, weighted by interval length and recency, widened to include the point rate.
// - Season (at least 395 days of history): last year's daily use for the coming weeks (readings
//   interpolated linearly, each interval's use spread evenly over its days), scaled by this year's
//   last 28 days against the same 28 days a year earlier (plus one average day on both sides so idle
//   against idle gives ×1; clamped to ×0.5…×2). A seasonal machine idle in spring is then forecast
//   to reach its due hours in the coming harvest, not never and not at last week's pace.
//   Its range: last year's use × min(scale, 1) × 0.8 to × max(scale, 1) × 1.2.
// Limits: a year that differs from last year beyond the ×0.5…×2 scale, or a machine newly moved to
// other work, shows as a miss until the trend window or the season scale catches up.
import type { ReadingPoint, UsageEstimate } from './types';
import { estimateSeason, seasonApplies } from './usage-season';
import { estimateTrend } from './usage-trend';

/** Tuning of estimateUsage; all in days. */
export interface UsageOptions {
  /** trend window before asOf, days (default 90) */
  windowDays?: number;
  /** recency half-life of the trend weights, days (default 21; Infinity = ordinary least squares) */
  halfLifeDays?: number;
  /** length of the season profile, days (default 400, so a projection can reach a year ahead) */
  horizonDays?: number;
  /** 'auto' picks season when a year of history exists (default); 'trend' never uses season */
  method?: 'auto' | 'trend';
}

/** Default tuning of estimateUsage, days. */
export const USAGE_DEFAULTS = { windowDays: 90, halfLifeDays: 21, horizonDays: 400 } as const;

/** Usage rate in meter units per day (point, low, high) as of a day number, from lifetime readings. */
export function estimateUsage(
  readings: ReadingPoint[],
  asOfDay: number,
  options: UsageOptions = {},
): UsageEstimate {
  const sorted = readings
    .filter((r) => Number.isFinite(r.day) && Number.isFinite(r.value))
    .sort((a, b) => a.day - b.day || a.value - b.value);
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  if (sorted.length < 2 || last.day - first.day < 1) {
    return {
      method: 'none',
      rate: 0,
      low: 0,
      high: 0,
      readingCount: sorted.length,
      lastDay: last?.day ?? null,
      lastValue: last?.value ?? null,
      explanation:
        sorted.length < 2
          ? 'Not enough readings yet: two readings at least a day apart are needed'
          : 'Readings span less than a day: too short to estimate use',
    };
  }
  if (options.method !== 'trend' && seasonApplies(sorted, asOfDay)) {
    return estimateSeason(sorted, asOfDay, options.horizonDays ?? USAGE_DEFAULTS.horizonDays);
  }
  return estimateTrend(
    sorted,
    asOfDay,
    options.windowDays ?? USAGE_DEFAULTS.windowDays,
    options.halfLifeDays ?? USAGE_DEFAULTS.halfLifeDays,
  );
}
