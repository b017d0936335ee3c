import { STALE_READING_DAYS } from '../../../../shared/constants';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';

// How the server's dealer figures read. Nothing here computes a forecast: each value is one the
// server sent, only worded. The due figures (dates, range) read as on the farm's due list, from
// src/lib/due-format.ts.

/** "read today", "read yesterday", "read 12 days ago", "no readings yet" */
export function readingAgeText(days: number | null): string {
  if (days === null) return 'no readings yet';
  if (days === 0) return 'read today';
  if (days === 1) return 'read yesterday';
  return `read ${days} days ago`;
}

/** A reading this old makes the projected date a guess: the board says so. */
export const isStaleReading = (days: number | null) => days === null || days >= STALE_READING_DAYS;

export const meterText = formatMeter;
export const dateText = formatLocalDate;
