// The as-of date and hand-built usage the due-point rule tests share: a trend of a given rate
// whose last reading was taken at the start of asOf, and no usage at all.
import { dayNumberFromIso } from '../../shared/domain/calendar';
import type { UsageEstimate } from '../../shared/domain/types';
import { referenceAddDays } from './fixtures';

export const asOf = '2025-06-02';
const asOfDay = dayNumberFromIso(asOf);
export const on = (days: number) => referenceAddDays(asOf, days);

/** A trend of `rate` units a day whose last reading, `value`, was taken at the start of asOf. */
export const trend = (value: number, rate: number): UsageEstimate => ({
  method: 'trend',
  rate,
  low: rate,
  high: rate,
  readingCount: 3,
  lastDay: asOfDay,
  lastValue: value,
  explanation: 'hand-built',
});
export const none: UsageEstimate = {
  method: 'none',
  rate: 0,
  low: 0,
  high: 0,
  readingCount: 0,
  lastDay: null,
  lastValue: null,
  explanation: 'hand-built',
};
