// Types of the forecasting and due-point math. Day numbers are *local* calendar days of the
// organization's time zone counted from 1970-01-01 (fractional part = local time of day / 24 h),
// so that daylight-saving changes never move a date. Meter values are lifetime values.
import type { SeasonAnchor } from './season-dates';

/** One reading as the forecast sees it: local day number (fractional) and lifetime meter value. */
export interface ReadingPoint {
  day: number;
  value: number;
}

/** Usage rate estimate in meter units per day, with a low/high range. */
export interface UsageEstimate {
  method: 'trend' | 'season' | 'none';
  /** point estimate, units per day, over the next 30 days */
  rate: number;
  low: number;
  high: number;
  /** how many readings the estimate rests on */
  readingCount: number;
  /** day number of the last reading, null without readings */
  lastDay: number | null;
  /** lifetime value at the last reading, null without readings */
  lastValue: number | null;
  /**
   * where projections start (day number, lifetime value): the last reading for 'trend'; for
   * 'season' the later of asOf and the last reading, with the value extrapolated to it. Optional so
   * hand-built estimates stay valid; projections fall back to lastDay/lastValue.
   */
  anchorDay?: number;
  anchorValue?: number;
  /** season only: projected usage per day for the next `profile.length` days (index 0 = day after asOf, i.e. after anchorDay), scaled */
  profile?: number[];
  /**
   * season only: the fast and slow sides of the range (profiles whose running totals are the 90th
   * and 10th percentiles of the meter's rise); without them the range is profile × scale factors
   */
  profileFast?: number[];
  profileSlow?: number[];
  /** season only: the scale factor this year vs. last year's same weeks */
  scale?: number;
  /** short human explanation shown in the UI */
  explanation: string;
}

/** A task's schedule as the due-point math needs it. */
export interface TaskSchedule {
  intervalMeter: number | null;
  intervalDays: number | null;
  firstServiceMeter: number | null;
  warnMeter: number | null;
  warnDays: number | null;
  /** last time done; null when never recorded */
  lastDoneMeter: number | null;
  /** ISO date (yyyy-mm-dd), local to the organization */
  lastDoneOn: string | null;
  /**
   * A start to count from when the last service is not known ("start counting from now"): a
   * lifetime meter value and an ISO date; used only while lastDone* are null.
   */
  countFromMeter?: number | null;
  countFromOn?: string | null;
  /**
   * true when the task came onto a machine that already had hours and nobody has said when it was
   * last done: the due point is then not guessed (status 'history_unknown').
   */
  historyUnknown?: boolean;
  /**
   * A season service falls due seasonOffsetDays calendar days before the machine's season starts
   * ('before_start') or after it ends ('after_end'), in place of a day interval; null otherwise.
   */
  seasonAnchor?: SeasonAnchor | null;
  seasonOffsetDays?: number | null;
}

/** The season a season service's due date hangs on. */
export interface DueSeason {
  anchor: SeasonAnchor;
  /** calendar days before the start or after the end */
  offsetDays: number;
  /** ISO date the season starts or ends; null when the machine has no season months (all year) */
  seasonDate: string | null;
}

/** Do a task before the busy season it would fall in: the last day before it, units early. */
export interface BeforePeak {
  /** ISO date: the last day before the busy season starts */
  doBy: string;
  /** how much of the interval is given up by doing it then, meter units */
  earlyBy: number;
}

/** A projected range split by an idle spell: ISO dates of each side, and the likelier side. */
export interface DueOutcomes {
  thisSeason: { from: string; to: string };
  nextSeason: { from: string; to: string };
  likelier: 'this_season' | 'next_season';
}

export type DueStatus = 'overdue' | 'due_soon' | 'ok' | 'no_forecast' | 'history_unknown';

/** The computed due point of one task. Dates are ISO local dates (yyyy-mm-dd). */
export interface DuePoint {
  status: DueStatus;
  /** which limit falls first: meter, calendar, or null when neither can be dated */
  governs: 'meter' | 'calendar' | null;
  dueMeter: number | null;
  dueDate: string | null;
  /** projected date the meter reaches dueMeter (point, earliest, latest); null when no forecast */
  projectedDate: string | null;
  projectedLow: string | null;
  projectedHigh: string | null;
  /** the date the task falls due: the earlier of dueDate and projectedDate */
  effectiveDate: string | null;
  remainingMeter: number | null;
  remainingDays: number | null;
  /**
   * 'recorded' when last done is known, 'first_service' for the break-in point, 'counted' from a
   * start someone set in place of an unknown history, 'unknown' while that history is unanswered,
   * 'assumed' otherwise
   */
  basis: 'recorded' | 'first_service' | 'assumed' | 'counted' | 'unknown';
  /**
   * when the projected range crosses an idle spell: the two outcomes (late this season, early
   * next) and the likelier one; absent otherwise
   */
  outcomes?: DueOutcomes;
  /** when the task falls due inside a busy season that has not started: do it before (absent otherwise) */
  beforePeak?: BeforePeak;
  /** season services only: the season start or end their date follows (dueDate is its date) */
  season?: DueSeason;
}
