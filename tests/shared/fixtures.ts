// Builders for the domain tests: a task schedule with overrides, and readings on ISO dates.
import { format, addDays, parseISO } from 'date-fns';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import type { ReadingPoint, TaskSchedule } from '../../shared/domain/types';

export function task(overrides: Partial<TaskSchedule> = {}): TaskSchedule {
  return {
    intervalMeter: null,
    intervalDays: null,
    firstServiceMeter: null,
    warnMeter: null,
    warnDays: null,
    lastDoneMeter: null,
    lastDoneOn: null,
    ...overrides,
  };
}

/** Readings given as [days after start, value] pairs, start an ISO date. */
export function readingsFrom(startIso: string, pairs: Array<[number, number]>): ReadingPoint[] {
  const start = dayNumberFromIso(startIso);
  return pairs.map(([day, value]) => ({ day: start + day, value }));
}

/** The reference library's answer for "iso plus n calendar days" (date-fns, local calendar). */
export function referenceAddDays(iso: string, n: number): string {
  return format(addDays(parseISO(iso), n), 'yyyy-MM-dd');
}

/** Readings every stepDays (at noon) of a machine using perDay(dayNumber) units on each day. */
export function seasonalReadings(
  startIso: string,
  endIso: string,
  stepDays: number,
  startValue: number,
  perDay: (dayNumber: number) => number,
): ReadingPoint[] {
  const readings: ReadingPoint[] = [];
  let value = startValue;
  const start = dayNumberFromIso(startIso);
  const end = dayNumberFromIso(endIso);
  for (let day = start; day <= end; day += 1) {
    if ((day - start) % stepDays === 0) readings.push({ day: day + 0.5, value });
    value += perDay(day);
  }
  return readings;
}

/** August to October, the harvest months of the seasonal examples. */
export function inHarvest(dayNumber: number): boolean {
  const month = new Date(dayNumber * 86_400_000).getUTCMonth(); // 7 = August … 9 = October
  return month >= 7 && month <= 9;
}
