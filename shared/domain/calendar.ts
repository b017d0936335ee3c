// Local-day helpers. A "day number" counts local calendar days of an organization's time zone from
// 1970-01-01; its fraction is the local time of day / 24 h. Date-only arithmetic is done on
// UTC-midnight numbers, so a daylight-saving change never shifts a date or stretches a day.
import { TZDate } from '@date-fns/tz';

const MS_PER_DAY = 86_400_000;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Local day number (days since 1970-01-01, fraction = local time of day / 24 h) of an instant in a time zone. */
export function localDayNumber(instant: Date | string, timeZone: string): number {
  const ms = typeof instant === 'string' ? Date.parse(instant) : instant.getTime();
  if (!Number.isFinite(ms)) throw new RangeError(`Invalid instant: ${String(instant)}`);
  const local = new TZDate(ms, timeZone);
  const year = local.getFullYear();
  if (!Number.isFinite(year)) throw new RangeError(`Unknown time zone: ${timeZone}`);
  const midnight = Date.UTC(year, local.getMonth(), local.getDate()) / MS_PER_DAY;
  const msOfDay =
    ((local.getHours() * 60 + local.getMinutes()) * 60 + local.getSeconds()) * 1000 +
    local.getMilliseconds();
  return midnight + msOfDay / MS_PER_DAY;
}

/** ISO date (yyyy-mm-dd) of a day number; the fraction (time of day) is dropped by flooring. */
export function isoFromDayNumber(day: number): string {
  if (!Number.isFinite(day)) throw new RangeError(`Invalid day number: ${day}`);
  return new Date(Math.floor(day) * MS_PER_DAY).toISOString().slice(0, 10);
}

/** Day number (integer, days since 1970-01-01) of an ISO date yyyy-mm-dd; throws on a non-date. */
export function dayNumberFromIso(iso: string): number {
  const match = ISO_DATE.exec(iso);
  if (!match) throw new RangeError(`Not an ISO date (yyyy-mm-dd): ${iso}`);
  const [year, month, date] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const ms = Date.UTC(year, month - 1, date);
  const back = new Date(ms);
  // Date.UTC rolls 2023-02-29 over to 03-01; refuse it instead.
  if (back.getUTCMonth() !== month - 1 || back.getUTCDate() !== date) {
    throw new RangeError(`No such date: ${iso}`);
  }
  return ms / MS_PER_DAY;
}

/** ISO date n calendar days after iso (n may be negative; fractional n is floored). */
export function addDaysIso(iso: string, n: number): string {
  return isoFromDayNumber(dayNumberFromIso(iso) + Math.floor(n));
}

/** Calendar days from ISO date a to ISO date b (positive when b is later). */
export function daysBetweenIso(a: string, b: string): number {
  return dayNumberFromIso(b) - dayNumberFromIso(a);
}

/** Today's local ISO date (yyyy-mm-dd) in a time zone, at `now` (default: the current instant). */
export function todayIso(timeZone: string, now: Date = new Date()): string {
  return isoFromDayNumber(localDayNumber(now, timeZone));
}
