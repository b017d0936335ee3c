// "Before the peak": a task the forecast puts inside the machine's busy season, while that season
// has not started yet, is better done before it — a stop for service in the middle of harvest
// costs more than a few hours of interval given up. The busy season is read off the median
// profile: the run of days around the projected date on which the machine works at least half its
// average working day, 14 days long at least (common practice for "a season", not a published
// figure). The advice: the last day before that run, and how many meter units early that is.
import { isoFromDayNumber } from './calendar';
import { averageWorkingDay, profileDay } from './profile-days';
import type { BeforePeak, UsageEstimate } from './types';

/** A busy day: at least this share of the profile's average working day (dimensionless). */
export const BUSY_SHARE = 0.5;
/** Shortest busy run that counts as a season, days. */
export const BUSY_SEASON_MIN_DAYS = 14;

/**
 * The "do it before" advice for a task whose meter due value is `dueMeter` and whose projected
 * date is day number `projectedDay`, or null when that date is not inside a coming busy season.
 */
export function beforePeak(
  usage: UsageEstimate,
  dueMeter: number | null,
  projectedDay: number | null,
  asOfDay: number,
): BeforePeak | null {
  const profile = usage.profile;
  const anchor = usage.anchorDay ?? usage.lastDay;
  const start = usage.anchorValue ?? usage.lastValue;
  if (usage.method !== 'season' || !profile?.length || anchor === null || start === null)
    return null;
  if (dueMeter === null || projectedDay === null) return null;
  const busy = BUSY_SHARE * averageWorkingDay(profile);
  const at = (i: number) => profileDay(profile, i) ?? 0;
  const due = Math.floor(projectedDay - anchor);
  if (!(at(due) >= busy && busy > 0)) return null;
  let first = due;
  while (first > 0 && at(first - 1) >= busy) first--;
  let last = due;
  while (last - first < 400 && at(last + 1) >= busy) last++;
  // the season has begun already (or begins today): too late to get ahead of it
  if (first === 0 || anchor + first <= asOfDay + 1) return null;
  if (last - first + 1 < BUSY_SEASON_MIN_DAYS) return null;
  let valueAtStart = start;
  for (let i = 0; i < first; i++) valueAtStart += at(i);
  return {
    doBy: isoFromDayNumber(Math.floor(anchor + first - 1)),
    earlyBy: Math.max(0, Math.round((dueMeter - valueAtStart) * 10) / 10),
  };
}
