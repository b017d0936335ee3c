// The running summary a machine's forecast reads (machine_forecasts): one point per local day —
// the day's last lifetime value at its fractional local day number — kept for SUMMARY_DAYS back
// from the last point, plus the reading count and the first and last readings. `summariseReadings`
// builds it from every reading; the functions below keep it up to date from the readings that
// changed alone, so a reading write costs the same on two years of hourly readings as on a week.
import { localDayNumber, type ReadingPoint } from '../../shared/domain';

/** Days of daily summary kept per machine: a season (365 d) plus comparison weeks and slack. */
export const SUMMARY_DAYS = 3 * 365;

/** A reading as the summary sees it: lifetime value (and the meter's own value) at an instant. */
export interface SummaryReading {
  lifetimeValue: number;
  /** the value on the meter fitted at the time */
  value: number;
  takenAt: Date;
}

/** Where a reading sits in (taken at, lifetime value) order, the order readings are listed in. */
export type ReadingPlace = Pick<SummaryReading, 'lifetimeValue' | 'takenAt'>;

export interface ReadingSummary {
  daily: ReadingPoint[];
  readingCount: number;
  first: ReadingPlace | null;
  last: SummaryReading | null;
}

/** The summary columns of machine_forecasts (MachineForecast's attributes). */
export interface SummaryColumns {
  daily: ReadingPoint[];
  readingCount: number;
  lastValue: number | null;
  lastRawValue: number | null;
  lastTakenAt: Date | null;
  firstTakenAt: Date | null;
  firstValue: number | null;
}

export const SUMMARY_COLUMNS = [
  'daily',
  'readingCount',
  'lastValue',
  'lastRawValue',
  'lastTakenAt',
  'firstTakenAt',
  'firstValue',
] as const satisfies readonly (keyof SummaryColumns)[];

/** Just the summary columns of a row (a model instance's attributes spread as plain fields). */
export const pickSummaryColumns = (row: SummaryColumns): SummaryColumns => ({
  daily: row.daily,
  readingCount: row.readingCount,
  lastValue: row.lastValue,
  lastRawValue: row.lastRawValue,
  lastTakenAt: row.lastTakenAt,
  firstTakenAt: row.firstTakenAt,
  firstValue: row.firstValue,
});

/** The summary a machine_forecasts row holds. */
export function summaryFromColumns(row: SummaryColumns): ReadingSummary {
  return {
    daily: row.daily,
    readingCount: row.readingCount,
    first:
      row.firstTakenAt && row.firstValue !== null
        ? { takenAt: row.firstTakenAt, lifetimeValue: row.firstValue }
        : null,
    last:
      row.lastTakenAt && row.lastValue !== null
        ? {
            takenAt: row.lastTakenAt,
            lifetimeValue: row.lastValue,
            value: row.lastRawValue ?? row.lastValue,
          }
        : null,
  };
}

/** The machine_forecasts columns of a summary. */
export function summaryColumns(summary: ReadingSummary): SummaryColumns {
  return {
    daily: summary.daily,
    readingCount: summary.readingCount,
    lastValue: summary.last?.lifetimeValue ?? null,
    lastRawValue: summary.last?.value ?? null,
    lastTakenAt: summary.last?.takenAt ?? null,
    firstTakenAt: summary.first?.takenAt ?? null,
    firstValue: summary.first?.lifetimeValue ?? null,
  };
}

export const emptySummary = (): ReadingSummary => ({
  daily: [],
  readingCount: 0,
  first: null,
  last: null,
});

/** Negative when a comes before b in (taken at, lifetime value) order. */
export const readingOrder = (a: ReadingPlace, b: ReadingPlace) =>
  a.takenAt.getTime() - b.takenAt.getTime() || a.lifetimeValue - b.lifetimeValue;

/**
 * Each local day's point (key: the whole day number) from readings in (taken at, lifetime value)
 * order: the reading latest in local time of day; of two at the same local time (the repeated hour
 * when clocks go back, or one instant) the later in that order.
 */
export function dayPointsOf(
  readings: Iterable<ReadingPlace>,
  timeZone: string,
): Map<number, ReadingPoint> {
  const byDay = new Map<number, ReadingPoint>();
  for (const r of readings) {
    const day = localDayNumber(r.takenAt, timeZone);
    const key = Math.floor(day);
    const prev = byDay.get(key);
    if (!prev || day >= prev.day) byDay.set(key, { day, value: r.lifetimeValue });
  }
  return byDay;
}

/** The points in day order, without those more than SUMMARY_DAYS before the last one. */
export function withinWindow(points: Iterable<ReadingPoint>): ReadingPoint[] {
  const sorted = [...points].sort((a, b) => a.day - b.day);
  const cutoff = (sorted.at(-1)?.day ?? 0) - SUMMARY_DAYS;
  return sorted.filter((p) => p.day >= cutoff);
}

/** Builds the per-day summary (each local day's last lifetime value) from a machine's readings. */
export function summariseReadings(readings: ReadingPlace[], timeZone: string): ReadingPoint[] {
  return withinWindow(dayPointsOf(readings, timeZone).values());
}

/** The whole summary of readings given in (taken at, lifetime value) order. */
export function summaryOf(readings: SummaryReading[], timeZone: string): ReadingSummary {
  return {
    daily: summariseReadings(readings, timeZone),
    readingCount: readings.length,
    first: readings[0] ?? null,
    last: readings.at(-1) ?? null,
  };
}

const keyOf = (p: ReadingPoint) => Math.floor(p.day);

/**
 * The summary with new readings added, from them alone: count, first, last and their days'
 * points. A day where a new reading ties the stored point's local time cannot be settled without
 * that day's other readings; its key is returned in `recheck` for the caller to read back.
 */
export function addReadings(
  summary: ReadingSummary,
  added: SummaryReading[],
  timeZone: string,
): { summary: ReadingSummary; recheck: Set<number> } {
  const byKey = new Map(summary.daily.map((p) => [keyOf(p), p]));
  const recheck = new Set<number>();
  let { first, last } = summary;
  for (const r of added) {
    if (!first || readingOrder(r, first) < 0) first = r;
    if (!last || readingOrder(r, last) >= 0) last = r;
    const day = localDayNumber(r.takenAt, timeZone);
    const key = Math.floor(day);
    const stored = byKey.get(key);
    // A day missing from the window either had no readings or only ones older than the cutoff,
    // which this one (if inside the window) is later than; withinWindow drops it otherwise.
    if (!stored || day > stored.day) byKey.set(key, { day, value: r.lifetimeValue });
    else if (day === stored.day) recheck.add(key);
  }
  return {
    summary: {
      daily: withinWindow(byKey.values()),
      readingCount: summary.readingCount + added.length,
      first,
      last,
    },
    recheck,
  };
}

/**
 * The daily points with the given days replaced by points read back from their readings (a day
 * absent from `days` has no readings left), windowed again from the new last point.
 */
export function replaceDays(
  daily: ReadingPoint[],
  keys: Iterable<number>,
  days: Map<number, ReadingPoint>,
): ReadingPoint[] {
  const byKey = new Map(daily.map((p) => [keyOf(p), p]));
  for (const key of keys) {
    const point = days.get(key);
    if (point) byKey.set(key, point);
    else byKey.delete(key);
  }
  return withinWindow(byKey.values());
}

/**
 * When a removal moved the last point back, days older than the old window may belong in the new
 * one: the whole-day keys to read back (inclusive range), or null when the window did not move.
 */
export function reopenedDays(before: ReadingPoint[], after: ReadingPoint[]) {
  const oldLast = before.at(-1)?.day;
  const newLast = after.at(-1)?.day;
  if (oldLast === undefined || newLast === undefined || newLast >= oldLast) return null;
  return {
    fromKey: Math.floor(newLast - SUMMARY_DAYS),
    toKey: Math.floor(oldLast - SUMMARY_DAYS),
    cutoff: newLast - SUMMARY_DAYS,
  };
}

/** The daily points with the reopened days' points (those inside the new window) added. */
export function addReopenedDays(
  daily: ReadingPoint[],
  reopened: Map<number, ReadingPoint>,
  cutoff: number,
): ReadingPoint[] {
  const byKey = new Map(daily.map((p) => [keyOf(p), p]));
  for (const [key, point] of reopened) {
    if (!byKey.has(key) && point.day >= cutoff) byKey.set(key, point);
  }
  return withinWindow(byKey.values());
}
