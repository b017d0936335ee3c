import { TZDate } from '@date-fns/tz';
import { addDaysIso, daysBetweenIso, todayIso } from '../../shared/domain';

// "Days since the last reading" counts the farm's calendar days in its own time zone: a reading
// at 22:30 on Monday in Chicago (04:30 Tuesday UTC) is one day old on Tuesday, not zero.

/** Local calendar days in `timeZone` from the date of `instant` to the date of `now`. */
export function localDaysSince(instant: Date, timeZone: string, now: Date): number {
  return daysBetweenIso(todayIso(timeZone, instant), todayIso(timeZone, now));
}

/**
 * The instant local midnight begins the day `days - 1` calendar days before today in `timeZone`:
 * a meter last read before it has gone `days` or more local days without a reading.
 */
export function staleCutoff(timeZone: string, now: Date, days: number): Date {
  const firstFreshDay = addDaysIso(todayIso(timeZone, now), -(days - 1));
  const [year, month, date] = firstFreshDay.split('-').map(Number);
  return new Date(new TZDate(year, month - 1, date, 0, 0, 0, timeZone).getTime());
}
