import { TZDate } from '@date-fns/tz';
import { addDays, addMonths, startOfDay, startOfMonth } from 'date-fns';

const DAY_MS = 86_400_000;

// The meter chart's time axis, in the farm's time zone: where a day sits, and where the ticks go.

/** Midday of a farm-local date (yyyy-mm-dd), as an instant (ms): where a day's service sits on the time axis. */
export function middayOf(isoDate: string, timeZone: string): number {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new TZDate(y, m - 1, d, 12, 0, timeZone).getTime();
}

/**
 * Ticks (instants, ms) on the first of a month in the farm's time zone, at most `max` of them; a
 * span shorter than two months gets `max` evenly spaced day ticks instead.
 */
export function timeTicks(
  [from, to]: [number, number],
  max: number,
  timeZone: string,
): { ticks: number[]; format: (t: number) => string } {
  const months: number[] = [];
  for (
    let month = addMonths(startOfMonth(new TZDate(from, timeZone)), 1);
    month.getTime() <= to;
    month = addMonths(month, 1)
  )
    months.push(month.getTime());
  if (months.length >= 2) {
    const step = Math.ceil(months.length / max);
    const label = new Intl.DateTimeFormat(undefined, {
      month: 'short',
      year: 'numeric',
      timeZone,
    });
    return { ticks: months.filter((_, i) => i % step === 0), format: (t) => label.format(t) };
  }
  const label = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', timeZone });
  const stepMs = (to - from) / (max - 1);
  if (stepMs >= DAY_MS)
    return {
      ticks: Array.from({ length: max }, (_, i) => Math.round(from + i * stepMs)),
      format: (t) => label.format(t),
    };
  // fewer days than ticks: one tick at midday of each farm day, so no date repeats
  const days: number[] = [];
  for (
    let day = startOfDay(new TZDate(from, timeZone));
    day.getTime() <= to;
    day = addDays(day, 1)
  ) {
    const midday = new TZDate(
      day.getFullYear(),
      day.getMonth(),
      day.getDate(),
      12,
      timeZone,
    ).getTime();
    if (midday >= from && midday <= to) days.push(midday);
  }
  return { ticks: days, format: (t) => label.format(t) };
}
