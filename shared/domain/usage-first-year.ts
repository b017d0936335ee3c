// A machine with less than a year of readings has no whole past year to repeat. When the manager
// has entered its season months, a stand-in year is built: the days its readings reach as they
// were, the others from the season months — season days at the pace it has shown on its season
// days so far (or the season's plan spread over its days, or a given typical pace), other days at the pace it has shown outside them — and the same scenarios as a real past year (usage-seasons.ts) place the
// season start and the pace, with wider spreads since one stand-in year knows less than a real one.
import { isoFromDayNumber } from './calendar';
import type { ReadingPoint } from './types';
import { lifetimeValueAt } from './usage-season';
import { EVIDENCE_DAYS, MAX_SHIFT_DAYS, YEAR_DAYS, type AnalogYear } from './usage-seasons';

/** Season days seen before the pace of a first season counts (days). */
export const FIRST_YEAR_MIN_SEASON_DAYS = 7;
/** Pace spread of the stand-in year (lognormal sd; common practice, wider than a real year's). */
export const FIRST_YEAR_PACE_SD = 0.3;

const monthOf = (day: number) => Number(isoFromDayNumber(Math.floor(day)).slice(5, 7));

/** Pace shown on season days and on other days (units per day), with how many days each rests on. */
function shownPaces(sorted: ReadingPoint[], months: Set<number>) {
  const first = sorted[0].day;
  const last = sorted[sorted.length - 1].day;
  const tally = { season: { use: 0, days: 0 }, other: { use: 0, days: 0 } };
  for (let d = first; d + 1 <= last + 1e-9; d++) {
    const side = months.has(monthOf(d)) ? tally.season : tally.other;
    side.use += Math.max(0, lifetimeValueAt(sorted, d + 1) - lifetimeValueAt(sorted, d));
    side.days += 1;
  }
  return tally;
}

/**
 * The stand-in year of a machine with season months and less than a year of readings, or null
 * when its season pace is unknown (no week of its season seen and no typical pace given).
 */
export function firstYearStandIn(
  sorted: ReadingPoint[],
  seasonMonths: readonly number[],
  prior: { typicalRate?: number | null; plannedUse?: number | null } = {},
): { year: AnalogYear; paceFrom: 'seen' | 'planned' | 'typical' } | null {
  if (!seasonMonths.length || seasonMonths.length >= 12) return null;
  const months = new Set(seasonMonths);
  const shown = shownPaces(sorted, months);
  const seen = shown.season.days >= FIRST_YEAR_MIN_SEASON_DAYS && shown.season.use > 0;
  const last = sorted[sorted.length - 1].day;
  let seasonDays = 0;
  for (let i = 0; i < YEAR_DAYS; i++) if (months.has(monthOf(last + i))) seasonDays++;
  // the plan's season use spread over the season's days
  const planned = prior.plannedUse && prior.plannedUse > 0 ? prior.plannedUse / seasonDays : null;
  const paceFrom = seen ? 'seen' : planned ? 'planned' : 'typical';
  const seasonRate = seen ? shown.season.use / shown.season.days : (planned ?? prior.typicalRate);
  if (!seasonRate || !(seasonRate > 0)) return null;
  const otherRate = shown.other.days ? shown.other.use / shown.other.days : 0;
  const lead = EVIDENCE_DAYS + MAX_SHIFT_DAYS;
  const first = sorted[0].day;
  const use: number[] = [];
  // a year back from the last reading: what the readings show where they reach, else the stand-in
  for (let i = -lead; i < YEAR_DAYS; i++) {
    const d = last - YEAR_DAYS + i;
    use.push(
      d >= first - 1e-9
        ? Math.max(0, lifetimeValueAt(sorted, d + 1) - lifetimeValueAt(sorted, d))
        : months.has(monthOf(last + i))
          ? seasonRate
          : otherRate,
    );
  }
  const total = use.slice(lead).reduce((s, u) => s + u, 0);
  return {
    year: { yearsBack: 0, use, lead, known: use.map(() => true), total },
    paceFrom,
  };
}
