import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';

// How the server's due figures read. Nothing here computes a forecast: each value is one the
// server sent, only worded.

const days = (n: number) => `${n} ${Math.abs(n) === 1 ? 'day' : 'days'}`;

/** "37.1 h left", "35 h over", "due now" */
export function remainingMeterText(remaining: number, unit: string): string {
  if (remaining > 0) return `${formatMeter(remaining, unit)} left`;
  if (remaining < 0) return `${formatMeter(-remaining, unit)} over`;
  return 'due now';
}

/** "39 days left", "12 days over", "due today" */
export function remainingDaysText(remaining: number): string {
  if (remaining > 0) return `${days(remaining)} left`;
  if (remaining < 0) return `${days(-remaining)} over`;
  return 'due today';
}

/** "29 Dec 2026 – 14 Jan 2027", or null when the server gave no range. */
export function projectedRangeText(low: string | null, high: string | null): string | null {
  if (!low || !high) return null;
  if (low === high) return formatLocalDate(low);
  // within one year the year is said once: "22 Dec – 29 Dec 2026"
  const start = formatLocalDate(low);
  const end = formatLocalDate(high);
  const sameYear = low.slice(0, 4) === high.slice(0, 4);
  return `${sameYear ? start.replace(/\s+\d{4}$/, '') : start} – ${end}`;
}

export const GOVERNS_TEXT = {
  meter: 'Meter governs',
  calendar: 'Date governs',
} as const;

export const BASIS_TEXT = {
  recorded: null,
  first_service: 'First service (break-in)',
  assumed: 'Last service not recorded',
  counted: 'Counted from a start set in place of an unknown last service',
  unknown: 'History unknown — set last done on the machine page',
} as const;
