// The 'season' usage estimate: past years as analogues (usage-seasons.ts) turned into the median,
// slow and fast profiles a due date is read from (usage-bands.ts). See usage.ts.
import type { ReadingPoint, UsageEstimate } from './types';
import { seasonMonthsText } from './season-months-text';
import { usageBands } from './usage-bands';
import { FIRST_YEAR_PACE_SD, firstYearStandIn } from './usage-first-year';
import {
  analogYears,
  SHIFT_PRIOR_SD_DAYS,
  paceSpread,
  shiftSpread,
  weighScenarios,
  type AnalogYear,
} from './usage-seasons';

const RATE_DAYS = 30;

const mean = (values: number[]) =>
  values.length ? values.reduce((s, v) => s + v, 0) / values.length : 0;

/** The estimate from given past years (real ones, or the first-year prior's). */
export function estimateFromYears(
  sorted: ReadingPoint[],
  asOfDay: number,
  horizonDays: number,
  years: AnalogYear[],
  spreads: { shiftSd: number; paceSd: number; plannedUse?: number | null },
  explanation: (likeliest: { yearsBack: number; shift: number; pace: number }) => string,
): UsageEstimate {
  const last = sorted[sorted.length - 1];
  const scenarios = weighScenarios(sorted, years, spreads.shiftSd, spreads.plannedUse ?? null);
  const days = Math.max(1, Math.ceil(horizonDays + Math.max(0, asOfDay - last.day)));
  const bands = usageBands(scenarios, days, spreads.paceSd);
  // rates over the 30 days from asOf (the profiles start the day after the last reading)
  const from = Math.max(0, Math.floor(asOfDay - last.day));
  const window = (p: number[]) => mean(p.slice(from, from + RATE_DAYS));
  const likeliest = scenarios.reduce((a, b) => (b.weight > a.weight ? b : a));
  return {
    method: 'season',
    rate: window(bands.point),
    low: window(bands.slow),
    high: window(bands.fast),
    readingCount: sorted.length,
    lastDay: last.day,
    lastValue: last.value,
    anchorDay: last.day,
    anchorValue: last.value,
    profile: bands.point,
    profileFast: bands.fast,
    profileSlow: bands.slow,
    explanation: explanation({
      yearsBack: likeliest.year.yearsBack,
      shift: likeliest.shift,
      pace: likeliest.pace,
    }),
  };
}

function shiftWords(shift: number) {
  if (Math.abs(shift) < 4) return 'at the same time';
  return `${Math.abs(shift)} days ${shift > 0 ? 'later' : 'earlier'}`;
}

/** Season estimate from readings sorted by day with at least one whole past year. */
export function estimateSeasons(
  sorted: ReadingPoint[],
  asOfDay: number,
  horizonDays: number,
  plannedUse: number | null = null,
): UsageEstimate {
  const years = analogYears(sorted);
  const plan =
    plannedUse !== null
      ? `; the season's plan, ${round1(plannedUse)}, sets its pace until the season shows its own`
      : '';
  return estimateFromYears(
    sorted,
    asOfDay,
    horizonDays,
    years,
    { shiftSd: shiftSpread(years), paceSd: paceSpread(years), plannedUse },
    (l) =>
      `${years.length === 1 ? 'Last year' : `The last ${years.length} years`}: likeliest like ` +
      `${l.yearsBack === 1 ? 'last year' : `${l.yearsBack} years ago`}, ${shiftWords(l.shift)}, ` +
      `at ×${l.pace.toFixed(2)} its pace${plan}`,
  );
}

const round1 = (n: number) => Math.round(n * 10) / 10;

const PACE_FROM = {
  seen: 'it has shown in its season so far',
  planned: "of the season's plan",
  typical: 'typical of its class',
} as const;

/**
 * First-year estimate from the season months (a stand-in year, usage-first-year.ts), or null when
 * the season pace is not known yet.
 */
export function estimateFirstYear(
  sorted: ReadingPoint[],
  asOfDay: number,
  horizonDays: number,
  seasonMonths: readonly number[],
  prior: { typicalRate?: number | null; plannedUse?: number | null } = {},
): UsageEstimate | null {
  const standIn = firstYearStandIn(sorted, seasonMonths, prior);
  if (!standIn) return null;
  return estimateFromYears(
    sorted,
    asOfDay,
    horizonDays,
    [standIn.year],
    { shiftSd: SHIFT_PRIOR_SD_DAYS, paceSd: FIRST_YEAR_PACE_SD },
    (l) =>
      // said plainly on the machine's page: where its dates come from while it is young
      `First year: dated from the season months entered for it (${seasonMonthsText(seasonMonths)}), not ` +
      `yet from a year of its own history; at the pace ${PACE_FROM[standIn.paceFrom]}` +
      `; likeliest ${shiftWords(l.shift)}, at ×${l.pace.toFixed(2)}`,
  );
}
