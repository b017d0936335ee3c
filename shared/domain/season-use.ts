// Season hours: a machine's use in its season this year against last year's, and the plan a
// manager may enter for a season — meter units, or an area with the work rate it is done at
// (hectares or acres per hour; planned hours = area ÷ rate) — which the forecast then takes as its
// prior for the season's pace (usage-seasons.ts). A season is the machine's season months in one
// calendar year (a season running over New Year counts its January part in the new year); a
// machine with no season months works all year: its season is the calendar year.
import { dayNumberFromIso } from './calendar';
import type { ReadingPoint } from './types';
import { lifetimeValueAt } from './usage-season';

/** A plan for one season: a meter value, or an area at a work rate (area per hour). */
export interface SeasonPlan {
  /** the meter it is planned on (the machine's primary when it was entered) and its unit */
  meterId: string;
  unit: string;
  value?: number | null;
  area?: number | null;
  areaUnit?: 'ha' | 'ac' | null;
  /** area per hour, in areaUnit per hour */
  areaPerHour?: number | null;
}

/** The plans of a machine by season year ("2027" → plan). */
export type SeasonPlans = Record<string, SeasonPlan>;

/** The season's planned use in meter units, or null without a plan it can say in that unit. */
export function plannedUse(plan: SeasonPlan | null | undefined, meterUnit: string): number | null {
  if (!plan) return null;
  if (plan.value !== null && plan.value !== undefined) return plan.value;
  if (plan.area && plan.areaPerHour && plan.areaPerHour > 0) {
    if (meterUnit === 'h') return plan.area / plan.areaPerHour;
    // an area meter counts the area itself
    if (
      (meterUnit === 'ha' && plan.areaUnit === 'ha') ||
      (meterUnit === 'acres' && plan.areaUnit === 'ac')
    )
      return plan.area;
  }
  return null;
}

/**
 * The season a plan is for on a local date: this year's while its season months have not all
 * passed, else next year's (a machine with no season months: the calendar year).
 */
export function planYear(asOfIso: string, months: readonly number[]): number {
  const year = Number(asOfIso.slice(0, 4));
  const month = Number(asOfIso.slice(5, 7));
  return months.length && month > Math.max(...months) ? year + 1 : year;
}

/**
 * The first local date (ISO) on which a plan for `year` feeds the forecast — where planYear turns
 * to it: 1 January of that year for a machine without season months (or a season ending in
 * December), else the first day after the season months of the year before.
 */
export function planCountsFrom(year: number, months: readonly number[]): string {
  const last = months.length ? Math.max(...months) : 12;
  return last === 12 ? `${year}-01-01` : `${year - 1}-${String(last + 1).padStart(2, '0')}-01`;
}

/** The planned use of a meter (meter units) for the season of asOf, or null without one. */
export function plannedUseOn(
  plans: SeasonPlans | null | undefined,
  meterId: string,
  asOfIso: string,
  months: readonly number[],
): number | null {
  const plan = plans?.[String(planYear(asOfIso, months))];
  return plan && plan.meterId === meterId ? plannedUse(plan, plan.unit) : null;
}

/** The local days of a season: its months in `year` as [from, to) day-number ranges. */
export function seasonDays(year: number, months: readonly number[]): [number, number][] {
  const list = months.length ? [...new Set(months)].sort((a, b) => a - b) : [];
  const pad = (n: number) => String(n).padStart(2, '0');
  const start = (y: number, m: number) => dayNumberFromIso(`${y}-${pad(m)}-01`);
  if (!list.length) return [[start(year, 1), start(year + 1, 1)]];
  return list.map((m) => [start(year, m), m === 12 ? start(year + 1, 1) : start(year, m + 1)]);
}

/**
 * Use on the season's days (of `seasonDays`) up to day number `until` (exclusive; the whole season
 * without it), from lifetime readings sorted by day; linear between readings.
 */
export function seasonUse(
  sorted: ReadingPoint[],
  ranges: [number, number][],
  until = Infinity,
): number {
  if (sorted.length < 2) return 0;
  let total = 0;
  for (const [from, to] of ranges) {
    const end = Math.min(to, until);
    if (end <= from) continue;
    total += lifetimeValueAt(sorted, end) - lifetimeValueAt(sorted, from);
  }
  return Math.max(0, total);
}
