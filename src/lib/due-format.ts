import {
  dueRangeText as rangeWords,
  dueSpreadText as spreadWords,
  beforePeakText as beforePeakWords,
  projectionWords as projectionWordsOf,
  type ProjectionWords,
  type BeforePeak,
  fallsDueText as fallsDueWords,
  fittedMeterText as fittedMeterWords,
  overText as overWords,
  remainingDaysText,
  remainingMeterText as meterWords,
  remainingText as remainingWords,
  seasonDueText as seasonWords,
  seasonTimingText,
  type DuePoint,
  type DueSeason,
} from '../../shared/domain';
import { formatLocalDate, formatMeter } from './fleet-format';

// How the server's due figures read on every screen (due list, dealer board, shop week, machine
// page). The words live in shared/domain/due-words.ts, which the e-mails use too; here they get
// the browser's number format and the farm's date format. Nothing here computes a forecast.

/** "37.1 h left", "35 h over", "due now": remaining meter units (negative when past due). */
export const remainingMeterText = (remaining: number, unit: string): string =>
  meterWords(remaining, unit, formatMeter);

/** "39 days left", "12 days over", "due today": remaining days (negative when past due). */
export { remainingDaysText };

/** "38 h over · 12 days over": both remaining figures, or null with neither. */
export const remainingText = (
  due: Pick<DuePoint, 'remainingMeter' | 'remainingDays'>,
  unit: string,
): string | null => remainingWords(due, unit, formatMeter);

/** "38 h over": only the figures past due (every figure when none is). */
export const overText = (
  due: Pick<DuePoint, 'remainingMeter' | 'remainingDays'>,
  unit: string,
): string | null => overWords(due, unit, formatMeter);

/** "29 Dec 2026": a due or projected date (ISO local date of the farm). */
export const dueDateText = formatLocalDate;

/** "22 Dec – 29 Dec 2026": the projected range (ISO local dates), null without one. */
export const dueRangeText = (low: string | null, high: string | null): string | null =>
  rangeWords(low, high, formatLocalDate);

/**
 * "range 22 – 29 Dec" or the two outcomes across an idle spell ("late this season … or early
 * next …"); null for an overdue task, whose projection is not said.
 */
export const dueSpreadText = (
  due: Pick<DuePoint, 'status' | 'projectedLow' | 'projectedHigh' | 'outcomes'>,
  options: { compact?: boolean } = {},
): string | null => spreadWords(due, formatLocalDate, options);

/** "Do it before 20 Jul: 200 h early, avoids a stop in the busy season". */
export const beforePeakText = (advice: BeforePeak, unit: string): string =>
  beforePeakWords(advice, unit, formatLocalDate, formatMeter);

/**
 * The projected date, its spread and the before-the-peak advice in the farm's formats, or null
 * when the projection is not said (none, or the task is overdue: only how far over it is).
 */
export const projectionWords = (
  due: Parameters<typeof projectionWordsOf>[0],
  unit: string,
): ProjectionWords | null =>
  projectionWordsOf(due, unit, { meter: formatMeter, date: formatLocalDate });

/** "234 h (1,956.3 h lifetime)": a value on the meter fitted now, lifetime in brackets. */
export const fittedMeterText = (onMeter: number, lifetime: number, unit: string): string =>
  fittedMeterWords(onMeter, lifetime, unit, formatMeter);

/** "overdue — 38 h over" for an overdue task, else the date it falls due; null without one. */
export const fallsDueText = (
  due: Pick<DuePoint, 'status' | 'effectiveDate' | 'remainingMeter' | 'remainingDays'>,
  unit: string,
): string | null => fallsDueWords(due, unit, { meter: formatMeter, date: formatLocalDate });

/** "21 days before the season starts": a season service's timing, without its date. */
export { seasonTimingText };

/** "14 days before the season starts on 1 Aug 2026", or "set the machine's season months". */
export const seasonDueText = (season: DueSeason): string => seasonWords(season, formatLocalDate);
