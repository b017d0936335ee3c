// How a machine's season months read in words: "Aug–Oct", "Nov–Feb" over New Year, "Mar, Jun"
// when apart, and "All year" without season months (the calendar year is then its season). One
// home for the machine's page (the first-year explanation) and the Season hours cards.

const ENGLISH_MONTHS = [
  'Jan',
  'Feb',
  'Mar',
  'Apr',
  'May',
  'Jun',
  'Jul',
  'Aug',
  'Sep',
  'Oct',
  'Nov',
  'Dec',
];

/** The season months (1–12) as a short label; none or all twelve: "All year". */
export function seasonMonthsText(
  months: readonly number[],
  monthName: (month: number) => string = (m) => ENGLISH_MONTHS[m - 1]!,
): string {
  const set = new Set(months);
  if (set.size === 0 || set.size === 12) return 'All year';
  const sorted = [...set].sort((a, b) => a - b);
  // start where the month before is not in the season, so a run over New Year stays one run
  const start = sorted.find((m) => !set.has(m === 1 ? 12 : m - 1)) ?? sorted[0]!;
  const ordered = [...sorted.filter((m) => m >= start), ...sorted.filter((m) => m < start)];
  const runs: number[][] = [];
  for (const month of ordered) {
    const run = runs.at(-1);
    if (run && (run.at(-1)! % 12) + 1 === month) run.push(month);
    else runs.push([month]);
  }
  return runs
    .map((run) =>
      run.length === 1 ? monthName(run[0]!) : `${monthName(run[0]!)}–${monthName(run.at(-1)!)}`,
    )
    .join(', ');
}
