// When a season's plan starts to feed the machine's forecast (shared/domain/season-use.ts
// planYear / planCountsFrom), said where the plan is entered: a plan for next year on a machine
// that works all year counts only from 1 January, which a manager planning in autumn would not guess.
import { planCountsFrom } from '../../../../shared/domain/season-use';
import { formatLocalDate } from '../../../lib/fleet-format';

/**
 * The plain words for when a plan for `year` starts to count in the forecast, or null when it
 * counts already (todayIso, the farm's local date, is on or after that day).
 */
export function planStartNote(
  year: number,
  seasonMonths: readonly number[],
  todayIso: string,
  date: (iso: string) => string = formatLocalDate,
): string | null {
  const from = planCountsFrom(year, seasonMonths);
  if (todayIso >= from) return null;
  const allYear = seasonMonths.length === 0 || new Set(seasonMonths).size === 12;
  if (allYear)
    return (
      `This machine works all year, so its season is the calendar year: a ${year} plan counts ` +
      `in its forecast only from ${date(from)}. Until then its due dates go by ${year - 1}.`
    );
  return (
    `A ${year} plan counts in its forecast from ${date(from)}, once the ${year - 1} season is ` +
    `over. Until then its due dates go by the ${year - 1} season.`
  );
}
