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
