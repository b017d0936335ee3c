import { formatLocalDate, formatMeter } from './fleet-format';

// How the server's due figures read, on the farm's due list and the dealer's board alike. Nothing
// here computes a forecast: each value is one the server sent, only worded. (The e-mails word
// them their own way, in server/services/digest.ts: "to go", dates with the weekday.)

const days = (n: number) => `${n} ${Math.abs(n) === 1 ? 'day' : 'days'}`;

/** "37.1 h left", "35 h over", "due now": remaining meter units (negative when past due). */
export function remainingMeterText(remaining: number, unit: string): string {
  if (remaining > 0) return `${formatMeter(remaining, unit)} left`;
  if (remaining < 0) return `${formatMeter(-remaining, unit)} over`;
  return 'due now';
}

/** "39 days left", "12 days over", "due today": remaining days (negative when past due). */
export function remainingDaysText(remaining: number): string {
  if (remaining > 0) return `${days(remaining)} left`;
  if (remaining < 0) return `${days(-remaining)} over`;
  return 'due today';
}

/** "29 Dec 2026": a due or projected date (ISO local date of the farm). */
export const dueDateText = formatLocalDate;

/**
 * "22 Dec – 29 Dec 2026", "29 Dec 2026 – 14 Jan 2027": the projected range (ISO local dates), one
 * date when both ends agree, null when the server gave no range.
 */
export function dueRangeText(low: string | null, high: string | null): string | null {
  if (!low || !high) return null;
  if (low === high) return dueDateText(low);
  // within one year the year is said once
  const start = dueDateText(low);
  const sameYear = low.slice(0, 4) === high.slice(0, 4);
  return `${sameYear ? start.replace(/\s+\d{4}$/, '') : start} – ${dueDateText(high)}`;
}
