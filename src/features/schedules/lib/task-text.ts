import type { SeasonAnchor } from '../../../../shared/domain/season-dates';
import { remainingText, seasonTimingText } from '../../../lib/due-format';
import { formatMeter } from '../../../lib/fleet-format';

const count = new Intl.NumberFormat();
const days = (n: number) => `${count.format(n)} ${n === 1 ? 'day' : 'days'}`;

/**
 * "Every 500 h or 365 days, whichever comes first", "21 days before the season starts", from the
 * task's own figures.
 */
export function describeInterval(
  task: {
    intervalMeter: number | null;
    intervalDays: number | null;
    seasonAnchor?: SeasonAnchor | null;
    seasonOffsetDays?: number | null;
  },
  unit: string,
): string {
  const { intervalMeter, intervalDays, seasonAnchor, seasonOffsetDays } = task;
  if (seasonAnchor && seasonOffsetDays != null) {
    const season = seasonTimingText(seasonAnchor, seasonOffsetDays);
    const said = `${season[0].toUpperCase()}${season.slice(1)}`;
    return intervalMeter !== null
      ? `${said} or every ${formatMeter(intervalMeter, unit)}, whichever comes first`
      : said;
  }
  if (intervalMeter !== null && intervalDays !== null)
    return `Every ${formatMeter(intervalMeter, unit)} or ${days(intervalDays)}, whichever comes first`;
  if (intervalMeter !== null) return `Every ${formatMeter(intervalMeter, unit)}`;
  if (intervalDays !== null) return `Every ${days(intervalDays)}`;
  return 'No interval';
}

/** "50 h or 14 days before": the warning window, or null without one. */
export function describeWarning(
  task: { warnMeter: number | null; warnDays: number | null },
  unit: string,
): string | null {
  const parts = [
    task.warnMeter !== null ? formatMeter(task.warnMeter, unit) : null,
    task.warnDays !== null ? days(task.warnDays) : null,
  ].filter(Boolean);
  return parts.length ? `${parts.join(' or ')} before` : null;
}

/**
 * The remaining meter and days as a phrase ("38 h over · 12 days over", "due now"), in the words
 * of the due list (src/lib/due-format.ts).
 */
export function describeRemaining(
  remainingMeter: number | null,
  remainingDays: number | null,
  unit: string,
): string | null {
  return remainingText({ remainingMeter, remainingDays }, unit);
}

export { days as formatDays };
