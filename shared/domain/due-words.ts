// How a due point's figures read, wherever they appear: the due list, the dealer board, the shop
// week, the machine page's schedule, the digest and calendar e-mails. Nothing here computes a
// forecast; each value is one computeDuePoint gave, only worded. The number and date formats are
// parameters so the browser can use its language and the e-mails their own; the words are one.
import type { SeasonAnchor } from './season-dates';
import type { BeforePeak, DuePoint, DueSeason } from './types';

/** How a meter value reads with its unit ("1,943.6 h"); value in meter units. */
export type MeterFormat = (value: number, unit: string) => string;
/** How an ISO local date (yyyy-mm-dd) reads ("29 Dec 2026"). */
export type DateFormat = (iso: string) => string;

// Built on first use, so a module that only borrows the words never needs a date formatter.
let numberFormat: Intl.NumberFormat | undefined;
let dateFormat: Intl.DateTimeFormat | undefined;
const englishNumber = {
  format: (n: number) =>
    (numberFormat ??= new Intl.NumberFormat('en', { maximumFractionDigits: 1 })).format(n),
};
const englishDate = {
  format: (d: Date) =>
    (dateFormat ??= new Intl.DateTimeFormat('en-GB', {
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      timeZone: 'UTC',
    })).format(d),
};

/** "1,943.6 h": meter units with at most one decimal, English grouping. */
export const englishMeter: MeterFormat = (value, unit) => `${englishNumber.format(value)} ${unit}`;
/** "29 Dec 2026" for an ISO local date, read as written (never shifted by a time zone). */
export const englishDateText: DateFormat = (iso) =>
  englishDate.format(new Date(`${iso}T00:00:00Z`));

const dayCount = (n: number) => `${englishNumber.format(n)} ${Math.abs(n) === 1 ? 'day' : 'days'}`;

/** "37.1 h left", "38 h over", "due now": remaining meter units (negative when past due). */
export function remainingMeterText(
  remaining: number,
  unit: string,
  meter: MeterFormat = englishMeter,
): string {
  if (remaining > 0) return `${meter(remaining, unit)} left`;
  if (remaining < 0) return `${meter(-remaining, unit)} over`;
  return 'due now';
}

/** "39 days left", "12 days over", "due today": remaining calendar days (negative when past due). */
export function remainingDaysText(remaining: number): string {
  if (remaining > 0) return `${dayCount(remaining)} left`;
  if (remaining < 0) return `${dayCount(-remaining)} over`;
  return 'due today';
}

/** "38 h over · 12 days over": both remaining figures a due point has, or null with neither. */
export function remainingText(
  due: Pick<DuePoint, 'remainingMeter' | 'remainingDays'>,
  unit: string,
  meter: MeterFormat = englishMeter,
): string | null {
  const parts = [
    due.remainingMeter !== null ? remainingMeterText(due.remainingMeter, unit, meter) : null,
    due.remainingDays !== null ? remainingDaysText(due.remainingDays) : null,
  ].filter((part): part is string => part !== null);
  return parts.length ? parts.join(' · ') : null;
}

/**
 * "38 h over · 12 days over": only the figures that are past due, for an overdue task's "how far
 * over" (falls back to every figure when none is negative, e.g. exactly at the due meter).
 */
export function overText(
  due: Pick<DuePoint, 'remainingMeter' | 'remainingDays'>,
  unit: string,
  meter: MeterFormat = englishMeter,
): string | null {
  const past = {
    remainingMeter:
      due.remainingMeter !== null && due.remainingMeter < 0 ? due.remainingMeter : null,
    remainingDays: due.remainingDays !== null && due.remainingDays < 0 ? due.remainingDays : null,
  };
  return remainingText(past, unit, meter) ?? remainingText(due, unit, meter);
}

/**
 * "Do it before 25 Jul: 60 h early, avoids a stop in the busy season": the before-the-peak advice
 * in words (meter units as the meter format says them).
 */
export function beforePeakText(
  advice: BeforePeak,
  unit: string,
  date: DateFormat = englishDateText,
  meter: MeterFormat = englishMeter,
): string {
  return `Do it before ${date(advice.doBy)}: ${meter(advice.earlyBy, unit)} early, avoids a stop in the busy season`;
}

/**
 * Whether a due point's projection is said at all: not without a projected date, and not once the
 * task is overdue (by its date or its meter) — then a projection running on into a later year is
 * noise, and only how far over it is matters (overText).
 */
export function projectionSaid(due: Pick<DuePoint, 'status' | 'projectedDate'>): boolean {
  return due.status !== 'overdue' && due.projectedDate !== null;
}

/** A projection in words: its date, its spread (dueSpreadText) and the before-the-peak advice. */
export interface ProjectionWords {
  date: string;
  spread: string | null;
  beforePeak: string | null;
}

/**
 * The projection of a due point as every screen and e-mail says it, or null when it is not said
 * (projectionSaid: none, or the task is overdue).
 */
export function projectionWords(
  due: Pick<
    DuePoint,
    'status' | 'projectedDate' | 'projectedLow' | 'projectedHigh' | 'outcomes' | 'beforePeak'
  >,
  unit: string,
  formats: { meter?: MeterFormat; date?: DateFormat } = {},
): ProjectionWords | null {
  if (!projectionSaid(due) || due.projectedDate === null) return null;
  const date = formats.date ?? englishDateText;
  return {
    date: date(due.projectedDate),
    spread: dueSpreadText(due, date),
    beforePeak: due.beforePeak ? beforePeakText(due.beforePeak, unit, date, formats.meter) : null,
  };
}

/**
 * A projection's spread in words: its range ("range 22 – 29 Dec 2026") or, when the range crosses
 * an idle spell, its two outcomes ("late this season (20 Sep – 31 Oct 2027) or early next
 * (1 – 26 Aug 2028), likelier this season"); null without a range, and for an overdue task (its
 * projection is not said: projectionSaid).
 */
export function dueSpreadText(
  due: Pick<DuePoint, 'status' | 'projectedLow' | 'projectedHigh' | 'outcomes'>,
  date: DateFormat = englishDateText,
  options: { compact?: boolean } = {},
): string | null {
  if (due.status === 'overdue') return null;
  const o = due.outcomes;
  // compact (a narrow column beside the likelier date): only the other side, without its dates
  if (o && options.compact)
    return o.likelier === 'this_season' ? 'or early next season' : 'or late this season';
  if (o) {
    const side = (s: { from: string; to: string }) => dueRangeText(s.from, s.to, date);
    const likelier = o.likelier === 'this_season' ? 'this season' : 'next season';
    return `late this season (${side(o.thisSeason)}) or early next (${side(o.nextSeason)}), likelier ${likelier}`;
  }
  const range = dueRangeText(due.projectedLow, due.projectedHigh, date);
  return range && due.projectedLow !== due.projectedHigh ? `range ${range}` : null;
}

/**
 * "22 Dec – 29 Dec 2026", "29 Dec 2026 – 14 Jan 2027": a projected range (ISO local dates), one
 * date when both ends agree, null without a range. Within one year the year is said once.
 */
export function dueRangeText(
  low: string | null,
  high: string | null,
  date: DateFormat = englishDateText,
): string | null {
  if (!low || !high) return null;
  if (low === high) return date(low);
  const start = date(low);
  const sameYear = low.slice(0, 4) === high.slice(0, 4);
  return `${sameYear ? start.replace(/,?\s+\d{4}$/, '') : start} – ${date(high)}`;
}

/**
 * "234 h (1,956.3 h lifetime)": a meter value as the meter fitted now reads it, with the lifetime
 * value in brackets when a meter replacement makes them differ; both in meter units. A value the
 * fitted meter never showed (it fell before the meter was fitted) is said on the lifetime scale
 * alone: "1,262 h lifetime (before the meter fitted now)".
 */
export function fittedMeterText(
  onMeter: number,
  lifetime: number,
  unit: string,
  meter: MeterFormat = englishMeter,
): string {
  if (onMeter < 0) return `${meter(lifetime, unit)} lifetime (before the meter fitted now)`;
  const shown = meter(onMeter, unit);
  return Math.abs(onMeter - lifetime) < 1e-9
    ? shown
    : `${shown} (${meter(lifetime, unit)} lifetime)`;
}

/**
 * When a task falls due, in words: "overdue — 38 h over" for an overdue task (whatever date the
 * projection gave), else its date; null when it cannot be dated.
 */
export function fallsDueText(
  due: Pick<DuePoint, 'status' | 'effectiveDate' | 'remainingMeter' | 'remainingDays'>,
  unit: string,
  formats: { meter?: MeterFormat; date?: DateFormat } = {},
): string | null {
  if (due.status === 'overdue') {
    const over = overText(due, unit, formats.meter);
    return over ? `overdue — ${over}` : 'overdue';
  }
  return due.effectiveDate ? (formats.date ?? englishDateText)(due.effectiveDate) : null;
}

/** "21 days before the season starts", "when the season ends": a season service's timing. */
export function seasonTimingText(anchor: SeasonAnchor, offsetDays: number): string {
  const event = anchor === 'before_start' ? 'the season starts' : 'the season ends';
  if (offsetDays === 0) return `when ${event}`;
  return `${dayCount(offsetDays)} ${anchor === 'before_start' ? 'before' : 'after'} ${event}`;
}

/** What a season service waits for on a machine without season months (all year). */
export const SEASON_MONTHS_MISSING = "set the machine's season months";

/**
 * "14 days before the season starts on 1 Aug 2026": a season service's due in words, from its
 * due point's season (ISO local date); without season months, what to do to get a date.
 */
export function seasonDueText(season: DueSeason, date: DateFormat = englishDateText): string {
  if (season.seasonDate === null) return SEASON_MONTHS_MISSING;
  return `${seasonTimingText(season.anchor, season.offsetDays)} on ${date(season.seasonDate)}`;
}
