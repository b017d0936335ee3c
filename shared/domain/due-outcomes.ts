// A projected range that crosses an idle spell — a combine's due hours reached either late this
// harvest or early the next — is not one stretched band: it is two outcomes, "late this season
// (from … to the season's end) or early next (from the next start to …)", and the point estimate
// says which is the likelier. An idle spell is a run of at least 30 days in which the median
// profile runs under 5 % of its own average working day (common practice for "not working": a
// few moves in the yard, not work).
import { dayNumberFromIso, isoFromDayNumber } from './calendar';
import { averageWorkingDay, profileDay } from './profile-days';
import type { DueOutcomes, UsageEstimate } from './types';

/** Shortest idle run that splits a range in two, days. */
export const IDLE_SPELL_DAYS = 30;
/** A day is idle below this share of the profile's average working day (dimensionless). */
export const IDLE_SHARE = 0.05;

/** The first idle spell of the median profile between two day numbers, as day numbers, or null. */
function idleSpell(usage: UsageEstimate, fromDay: number, toDay: number) {
  const profile = usage.profile;
  const anchor = usage.anchorDay ?? usage.lastDay;
  if (!profile?.length || anchor === null) return null;
  const idle = IDLE_SHARE * averageWorkingDay(profile);
  if (!(idle > 0)) return null;
  const at = (day: number) => profileDay(profile, Math.floor(day - anchor)) ?? Infinity;
  let start: number | null = null;
  for (let day = Math.floor(fromDay) + 1; day <= toDay; day++) {
    if (at(day) < idle) {
      start ??= day;
      continue;
    }
    if (start !== null && day - start >= IDLE_SPELL_DAYS) return { start, end: day };
    start = null;
  }
  return null;
}

/**
 * Two outcomes of a projection (ISO dates: earliest, point, latest) when its range crosses an
 * idle spell of the machine's season profile; null otherwise (one range says it).
 */
export function dueOutcomes(
  usage: UsageEstimate,
  low: string | null,
  point: string | null,
  high: string | null,
): DueOutcomes | null {
  if (usage.method !== 'season' || !low || !point || !high) return null;
  const spell = idleSpell(usage, dayNumberFromIso(low), dayNumberFromIso(high));
  if (!spell) return null;
  const lastIdle = isoFromDayNumber(spell.start - 1);
  const backAt = isoFromDayNumber(spell.end);
  return {
    thisSeason: { from: low, to: lastIdle },
    nextSeason: { from: backAt, to: high },
    likelier: dayNumberFromIso(point) < spell.start ? 'this_season' : 'next_season',
  };
}
