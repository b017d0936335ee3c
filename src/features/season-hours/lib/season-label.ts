// How a machine's season months read on its card, in the browser's own month names
// (shared/domain/season-months-text.ts: "Aug–Oct", "Nov–Feb" over New Year, "All year").
import { seasonMonthsText } from '../../../../shared/domain/season-months-text';

const shortMonth = new Intl.DateTimeFormat(undefined, { month: 'short', timeZone: 'UTC' });
const monthName = (month: number) => shortMonth.format(new Date(Date.UTC(2024, month - 1, 1)));

/** The season months (1–12) as a short label; none or all twelve: "All year". */
export function seasonLabel(months: readonly number[]): string {
  return seasonMonthsText(months, monthName);
}
