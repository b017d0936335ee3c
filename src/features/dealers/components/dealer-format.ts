import { STALE_READING_DAYS } from '../../../../shared/constants';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';

// How the server's dealer figures read. Nothing here computes a forecast: each value is one the
// server sent, only worded.

/** "read today", "read yesterday", "read 12 days ago", "no readings yet" */
export function readingAgeText(days: number | null): string {
  if (days === null) return 'no readings yet';
  if (days === 0) return 'read today';
  if (days === 1) return 'read yesterday';
  return `read ${days} days ago`;
}

/** A reading this old makes the projected date a guess: the board says so. */
export const isStaleReading = (days: number | null) => days === null || days >= STALE_READING_DAYS;

/** "22 Dec – 29 Dec 2026", one date when both ends agree, null when the server gave no range. */
export function rangeText(low: string | null, high: string | null): string | null {
  if (!low || !high) return null;
  if (low === high) return formatLocalDate(low);
  const start = formatLocalDate(low);
  const sameYear = low.slice(0, 4) === high.slice(0, 4);
  return `${sameYear ? start.replace(/\s+\d{4}$/, '') : start} – ${formatLocalDate(high)}`;
}

export const meterText = formatMeter;
export const dateText = formatLocalDate;
