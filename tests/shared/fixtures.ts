// Builders for the domain tests: a task schedule with overrides, and readings on ISO dates.
import { format, addDays, parseISO } from 'date-fns';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import type { ReadingPoint, TaskSchedule, UsageEstimate } from '../../shared/domain/types';

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

/** The day the idle-season examples are read on (due-outcomes, due-words-overdue tests). */
export const IDLE_SEASON_AS_OF = '2027-08-01';

/**
 * A hand-built season method estimate on IDLE_SEASON_AS_OF at 1,000 h: 60 working days a year at
 * 4 h/day (fast 5, slow 3), then 305 idle, repeating.
 */
export function idleSeasonUsage(): UsageEstimate {
  const asOf = dayNumberFromIso(IDLE_SEASON_AS_OF);
  const season = (perDay: number) => Array.from({ length: 365 }, (_, i) => (i < 60 ? perDay : 0));
  return {
    method: 'season',
    rate: 4,
    low: 3,
    high: 5,
    readingCount: 700,
    lastDay: asOf,
    lastValue: 1000,
    anchorDay: asOf,
    anchorValue: 1000,
    profile: season(4),
    profileFast: season(5),
    profileSlow: season(3),
    explanation: 'hand-built',
  };
}
