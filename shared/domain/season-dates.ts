// Season dates of a machine and the due date of its season services. A machine's season months
// (1–12) fall into runs of consecutive months, wrapping December → January ([11, 12, 1, 2] is one
// winter season); each run is a season, so spring and fall work ([3, 4, 5, 9, 10, 11]) are two
// seasons a year. A season starts on the 1st of its first month and ends on the last day of its
// last month. Dates are the organization's local ISO dates (yyyy-mm-dd), as in due-point.ts.
import { addDaysIso } from './calendar';

/** A season service falls due a set number of days before its season starts or after it ends. */
export const SEASON_ANCHORS = ['before_start', 'after_end'] as const;
export type SeasonAnchor = (typeof SEASON_ANCHORS)[number];

/** Most days a season service may sit before a start or after an end (about four months). */
export const MAX_SEASON_OFFSET_DAYS = 120;

/** One season of one year: the ISO dates of its first and last day. */
export interface SeasonSpan {
  start: string;
  end: string;
}

/** The due date (ISO) of a season service and the season it serves. */
export interface SeasonDue {
  dueDate: string;
  season: SeasonSpan;
}

const previousMonth = (m: number) => (m === 1 ? 12 : m - 1);
const nextMonth = (m: number) => (m === 12 ? 1 : m + 1);
const pad = (n: number) => String(n).padStart(2, '0');
/** Days in a month of a year (month 1–12), leap years included. */
const daysInMonth = (year: number, month: number) =>
  new Date(Date.UTC(year, month, 0)).getUTCDate();

/**
 * The seasons of a list of months 1–12 as runs of consecutive months (wrapping December →
 * January), ordered by their first month; [] when the machine works all year (no month, or all
 * twelve), as a year-round machine has no start or end. Repeated months count once.
 */
export function seasonRuns(months: readonly number[]): number[][] {
  const season = new Set(months.filter((m) => Number.isInteger(m) && m >= 1 && m <= 12));
  if (season.size === 0 || season.size === 12) return [];
  const runs: number[][] = [];
  for (let first = 1; first <= 12; first += 1) {
    // a run begins where the month before it is out of season
    if (!season.has(first) || season.has(previousMonth(first))) continue;
    const run = [first];
    for (let m = nextMonth(first); season.has(m); m = nextMonth(m)) run.push(m);
    runs.push(run);
  }
  return runs;
}

/** Every season starting in the years fromYear…toYear (ISO dates), in calendar order. */
export function seasonSpans(months: readonly number[], fromYear: number, toYear: number) {
  const spans: SeasonSpan[] = [];
  for (let year = fromYear; year <= toYear; year += 1) {
    for (const run of seasonRuns(months)) {
      const first = run[0];
      const last = run[run.length - 1];
      // a run that wraps past December ends in the next year
      const endYear = last < first ? year + 1 : year;
      spans.push({
        start: `${year}-${pad(first)}-01`,
        end: `${endYear}-${pad(last)}-${pad(daysInMonth(endYear, last))}`,
      });
    }
  }
  return spans.sort((a, b) => a.start.localeCompare(b.start));
}

/** The seasons around an ISO date: from the year before it to two years after. */
const spansAround = (months: readonly number[], iso: string) => {
  const year = Number(iso.slice(0, 4));
  return seasonSpans(months, year - 1, year + 2);
};

/** What a season service counts from: its last service, or a start date when never done. */
export interface SeasonHistory {
  /** ISO date of the last service, null when never recorded */
  lastDoneOn: string | null;
  /** ISO date to count from when never done: the count-from date, the first reading, or today */
  countFrom: string;
}

/**
 * Season the next pre-season service serves. A service covers the season it was done in, or,
 * done between seasons, the season that starts next; the one after is due. Never done: the
 * first season that starts on or after the date counted from is due (a season under way then is
 * not asked for afterwards).
 */
function preSeason(months: readonly number[], history: SeasonHistory): SeasonSpan | null {
  if (history.lastDoneOn === null) {
    const from = history.countFrom;
    return spansAround(months, from).find((s) => s.start >= from) ?? null;
  }
  const done = history.lastDoneOn;
  const spans = spansAround(months, done);
  const covered = spans.findIndex((s) => s.end >= done);
  return covered < 0 ? null : (spans[covered + 1] ?? null);
}

/**
 * Season the next storage service serves. A storage service done after a season's end covers
 * that season; the first season ending on or after the last service (the one it was done in,
 * or the next) is due. Never done: the first season that ends on or after the date counted from.
 */
function storage(months: readonly number[], history: SeasonHistory): SeasonSpan | null {
  const from = history.lastDoneOn ?? history.countFrom;
  return spansAround(months, from).find((s) => s.end >= from) ?? null;
}

/**
 * Due date (ISO) of a season service: offsetDays calendar days before the start of the season it
 * serves ('before_start', the pre-season service) or after its end ('after_end', the storage
 * service). Null when the machine works all year (no season months): it has no season date.
 */
export function seasonServiceDue(
  months: readonly number[],
  anchor: SeasonAnchor,
  offsetDays: number,
  history: SeasonHistory,
): SeasonDue | null {
  const season = anchor === 'before_start' ? preSeason(months, history) : storage(months, history);
  if (!season) return null;
  const dueDate =
    anchor === 'before_start'
      ? addDaysIso(season.start, -offsetDays)
      : addDaysIso(season.end, offsetDays);
  return { dueDate, season };
}
