// Month names for the season checkboxes (1 = January), in the browser's language.
const monthName = new Intl.DateTimeFormat(undefined, { month: 'long', timeZone: 'UTC' });

export const MONTH_OPTIONS = Array.from({ length: 12 }, (_, index) => ({
  value: index + 1,
  label: monthName.format(new Date(Date.UTC(2024, index, 1))),
}));

const shortMonth = new Intl.DateTimeFormat(undefined, { month: 'short', timeZone: 'UTC' });

/** "Jun, Jul, Aug, Sep", or "All year" without a season. */
export const formatSeason = (months: number[]) =>
  months.length === 0 || months.length === 12
    ? 'All year'
    : months.map((m) => shortMonth.format(new Date(Date.UTC(2024, m - 1, 1)))).join(', ');
