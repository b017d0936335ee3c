// When a meter is stale: not after a fixed number of days, but when the hours that may have gone
// unrecorded at the machine's current pace matter — a combine in harvest at 10 h/day is stale
// after two days without a reading, a tractor in winter at half an hour a day is not after twenty.
// The pace is the forecast's (its rate over the coming 30 days); what "matters" is a share of the
// machine's shortest meter interval, since that is the service it could miss. A meter with no
// pace yet (one reading) goes by days, as before: 14 in season. These thresholds
// are the method's choices (common practice), not published figures.

/** Unrecorded use that makes a meter stale, as a share of its shortest meter interval. */
export const STALE_SHARE_OF_INTERVAL = 0.05;
/** The same threshold for a meter whose tasks have no meter interval (meter units). */
export const STALE_UNITS_WITHOUT_INTERVAL = 10;
/** A meter read within this many local days is never stale (days). */
export const STALE_MIN_DAYS = 2;
/** In season, a meter whose pace is not known yet is stale after this many days (days). */
export const STALE_DAYS_WITHOUT_PACE = 14;
/** In season, a meter unread this long is stale whatever its pace says (days). */
export const STALE_MAX_DAYS = 60;

export interface StaleInput {
  /** local calendar days since the last reading; null = never read */
  daysSince: number | null;
  /** the forecast's pace, meter units a day (0 when idle); null when it has none yet */
  ratePerDay: number | null;
  /** the shortest meter interval of the meter's tasks, meter units; null when none has one */
  shortestInterval: number | null;
  /** whether today falls in the machine's season months (or it has none) */
  inSeason: boolean;
}

/** Use that may have gone unrecorded since the last reading, meter units (0 when never read). */
export function unrecordedUse(daysSince: number | null, ratePerDay: number | null): number {
  return daysSince === null ? 0 : Math.max(0, daysSince) * Math.max(0, ratePerDay ?? 0);
}

/** The unrecorded use above which a meter is stale, meter units. */
export function staleThreshold(shortestInterval: number | null): number {
  return shortestInterval && shortestInterval > 0
    ? STALE_SHARE_OF_INTERVAL * shortestInterval
    : STALE_UNITS_WITHOUT_INTERVAL;
}

/** Whether a meter's readings are stale (see the file's head). */
export function isStaleMeter(input: StaleInput): boolean {
  if (input.daysSince === null) return input.inSeason;
  if (input.daysSince < STALE_MIN_DAYS) return false;
  if (input.ratePerDay === null)
    return input.inSeason && input.daysSince >= STALE_DAYS_WITHOUT_PACE;
  if (input.inSeason && input.daysSince >= STALE_MAX_DAYS) return true;
  return unrecordedUse(input.daysSince, input.ratePerDay) >= staleThreshold(input.shortestInterval);
}
