// Usage rate of one machine, in meter units per day, from its lifetime readings.
//
// Method (quoted in the README, "How due dates are forecast"):
// - Fewer than two readings, or readings spanning less than a day: no estimate ('none').
// - Season (readings spanning a year or more): every past year (up to four, older ones weighted
//   less) as an analogue of the coming one, moved in time and scaled in pace by what this year's
//   last six weeks show, each scenario weighted by how well it fits them (usage-seasons.ts); the
//   forecast is the median of the meter's rise across scenarios and its range the 10th–90th
//   percentiles (usage-bands.ts), so a late or early season start and a heavier or lighter year
//   both widen it.
// - First year (less than a year of readings, season months entered): the same with a stand-in
//   year made of the readings so far and the season months (usage-first-year.ts); without a week
//   of its season seen, its pace is unknown and the trend answers.
// - Trend (otherwise): weighted least squares of lifetime value on day over the readings of the
//   last 90 days, each weighted 2^(-age / 21 days), so recent weeks count most; fewer than two
//   readings in the window → the last two readings overall (a meter that has not moved means an
//   idle machine: rate 0). The range is the 20th–80th percentile of the rates between consecutive
//   readings, weighted by interval length and recency, widened to include the point rate.
// - 'previous' (asked for by the accuracy benchmark only): last year's same weeks scaled by the
//   last 28 days against a year earlier (usage-season.ts), the method before this one.
import type { ReadingPoint, UsageEstimate } from './types';
import { estimateSeason, seasonApplies } from './usage-season';
import { estimateFirstYear, estimateSeasons } from './usage-seasons-estimate';
import { YEAR_DAYS } from './usage-seasons';
import { estimateTrend } from './usage-trend';

/** Tuning of estimateUsage; all in days. */
export interface UsageOptions {
  /** trend window before asOf, days (default 90) */
  windowDays?: number;
  /** recency half-life of the trend weights, days (default 21; Infinity = ordinary least squares) */
  halfLifeDays?: number;
  /** length of the season profile, days (default 400, so a projection can reach a year ahead) */
  horizonDays?: number;
  /**
   * 'auto' (default) picks season when a year of readings exists, else the first-year prior when
   * season months are given, else trend; 'trend' never uses a season; 'previous' is the method
   * before this one (last year's weeks scaled by the last 28 days), kept for the accuracy benchmark
   */
  method?: 'auto' | 'trend' | 'previous';
  /** the machine's season months (1–12; [] = all year): the prior of a machine in its first year */
  seasonMonths?: readonly number[];
  /** a typical in-season pace of its class (units per day), when known: the first-year prior's pace */
  typicalRate?: number | null;
  /**
   * the manager's plan for the coming (or current) season, meter units (season-use.ts): the pace
   * prior of every scenario until this year's use shows its own, and a first year's season pace
   */
  plannedSeasonUse?: number | null;
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
  const horizon = options.horizonDays ?? USAGE_DEFAULTS.horizonDays;
  if (options.method === 'previous' && seasonApplies(sorted, asOfDay)) {
    return estimateSeason(sorted, asOfDay, horizon);
  }
  if (options.method === 'auto' || options.method === undefined) {
    const planned = options.plannedSeasonUse ?? null;
    if (last.day - first.day >= YEAR_DAYS)
      return estimateSeasons(sorted, asOfDay, horizon, planned);
    const months = options.seasonMonths ?? [];
    const prior =
      months.length > 0 &&
      estimateFirstYear(sorted, asOfDay, horizon, months, {
        typicalRate: options.typicalRate ?? null,
        plannedUse: planned,
      });
    if (prior) return prior;
  }
  return estimateTrend(
    sorted,
    asOfDay,
    options.windowDays ?? USAGE_DEFAULTS.windowDays,
    options.halfLifeDays ?? USAGE_DEFAULTS.halfLifeDays,
  );
}
