// The 'season' usage method: every past year of the machine as an analogue of the coming one,
// each moved in time (when the season starts) and scaled (how hard the machine works in it).
// See usage.ts for the method as a whole and README "How due dates are forecast" for an example.
//
// For each past year k (1 = the year before the last reading, up to four) and each shift s of
// −35…+35 days (+ = this year runs later), a scenario says: the coming days repeat year k's days
// s days later, at pace p. How likely each scenario is comes from
// - a prior on the shift: normal around 0 with the spread of season starts between past years
//   (with fewer than two years, 14 days: starts move one to three weeks with the weather — common
//   practice, not a published figure), and older years weighted 0.6× the next newer;
// - this year's last six weeks of use against year k's matching six weeks at that shift: a season
//   that has started late, or not yet, rules out the shifts that would have shown work by now.
// The pace p of a scenario is this year's use over those six weeks against year k's at that shift,
// with two weeks of year k's average use added to both sides (so weak evidence leaves p near 1),
// held within ×0.5…×2; around it the pace varies by the spread of past years' totals (a lognormal
// sd, 0.2 with fewer than three years — common practice). The forecast is then the distribution
// of the meter over the coming days across all scenarios: see usage-bands.ts.
import type { ReadingPoint } from './types';
import { lifetimeValueAt } from './usage-season';

export const YEAR_DAYS = 365;
/** Past years used at most. */
export const MAX_ANALOG_YEARS = 4;
/** Weight of each past year relative to the next more recent one (dimensionless). */
export const OLDER_YEAR_WEIGHT = 0.6;
/** Largest season shift considered, days. */
export const MAX_SHIFT_DAYS = 35;
/** Season-start spread assumed with fewer than two past years, days (sd; common practice). */
export const SHIFT_PRIOR_SD_DAYS = 14;
/** Year-to-year pace spread assumed with fewer than three past years (lognormal sd; common practice). */
export const PACE_PRIOR_SD = 0.2;
/** This year's evidence: the last six weeks before the last reading, days. */
export const EVIDENCE_DAYS = 42;
/** Limits of a scenario's pace against its past year (dimensionless). */
export const PACE_LIMITS = { min: 0.5, max: 2 } as const;

const SHIFT_STEP = 2;
// One odd week (a breakdown, a hired-in job) counts at most this much against a scenario.
const MISFIT_CAP = 4;
const MAX_SCENARIOS = 80;
const WEEK = 7;

/** One past year as seen from the last reading: daily use from 42 + 35 days before to a year after. */
export interface AnalogYear {
  /** 1 = the year before the last reading */
  yearsBack: number;
  /** use of day (i − lead) of the year, i = 0…; index `lead` = the same date as the last reading */
  use: number[];
  lead: number;
  /** whether that day lies inside the readings (before it the analogue knows nothing) */
  known: boolean[];
  /** the year's total use, meter units */
  total: number;
}

/** A scenario of the coming year: past year k, moved by shift days, at pace × its own. */
export interface Scenario {
  year: AnalogYear;
  shift: number;
  pace: number;
  /** share of this year's evidence in the pace (0 = none: the pace is the past year's) */
  evidence: number;
  weight: number;
}

/** Past years whose whole year lies inside the readings (sorted by day), newest first. */
export function analogYears(sorted: ReadingPoint[]): AnalogYear[] {
  const first = sorted[0].day;
  const last = sorted[sorted.length - 1].day;
  const lead = EVIDENCE_DAYS + MAX_SHIFT_DAYS;
  const years: AnalogYear[] = [];
  for (let k = 1; k <= MAX_ANALOG_YEARS && last - k * YEAR_DAYS >= first - 1e-9; k++) {
    const start = last - k * YEAR_DAYS;
    const use: number[] = [];
    const known: boolean[] = [];
    for (let i = -lead; i < YEAR_DAYS; i++) {
      const d = start + i;
      known.push(d >= first - 1e-9);
      use.push(Math.max(0, lifetimeValueAt(sorted, d + 1) - lifetimeValueAt(sorted, d)));
    }
    const total = use.slice(lead).reduce((s, u) => s + u, 0);
    years.push({ yearsBack: k, use, lead, known, total });
  }
  return years;
}

/** Use on day j of a past year counted from the same date as the last reading (j may be < 0 or ≥ 365). */
export function analogUse(year: AnalogYear, j: number): number {
  let index = j;
  if (index >= YEAR_DAYS) index %= YEAR_DAYS;
  if (index < -year.lead || (index < 0 && !year.known[index + year.lead])) index += YEAR_DAYS;
  return year.use[index + year.lead];
}

/** Running totals of a past year's use: before its start (from −lead) and over one year. */
interface RunningTotals {
  before: number[];
  within: number[];
}
const running = new WeakMap<AnalogYear, RunningTotals>();

function runningTotals(year: AnalogYear): RunningTotals {
  const before = [0];
  for (let j = -year.lead; j < 0; j++) before.push(before[before.length - 1] + analogUse(year, j));
  const within = [0];
  for (let j = 0; j < YEAR_DAYS; j++) within.push(within[j] + year.use[j + year.lead]);
  const totals = { before, within };
  running.set(year, totals);
  return totals;
}

function sumUpTo(totals: RunningTotals, lead: number, x: number): number {
  if (x <= 0) return totals.before[Math.max(0, x + lead)];
  const whole = Math.floor(x / YEAR_DAYS);
  return (
    totals.before[lead] + whole * totals.within[YEAR_DAYS] + totals.within[x - whole * YEAR_DAYS]
  );
}

/**
 * Use of a past year from day a to day b (a ≤ b, whole days counted like analogUse, the year
 * repeating past its end), from running totals kept per year: O(1) a call.
 */
export function analogSum(year: AnalogYear, a: number, b: number): number {
  const totals = running.get(year) ?? runningTotals(year);
  return sumUpTo(totals, year.lead, b) - sumUpTo(totals, year.lead, a);
}

/** Daily use over the last `days` days before the last reading, oldest first. */
function recentUse(sorted: ReadingPoint[], days: number) {
  const last = sorted[sorted.length - 1].day;
  const first = sorted[0].day;
  const out: (number | null)[] = [];
  for (let i = -days; i < 0; i++) {
    const d = last + i;
    out.push(
      d < first - 1e-9
        ? null
        : Math.max(0, lifetimeValueAt(sorted, d + 1) - lifetimeValueAt(sorted, d)),
    );
  }
  return out;
}

function weekSums(values: (number | null)[]): (number | null)[] {
  const out: (number | null)[] = [];
  for (let w = 0; w < values.length; w += WEEK) {
    const week = values.slice(w, w + WEEK);
    out.push(week.some((v) => v === null) ? null : week.reduce<number>((s, v) => s + (v ?? 0), 0));
  }
  return out;
}

/** Best shift of year b against year a over whole years (weekly sums, pace fitted), days. */
function shiftBetween(a: AnalogYear, b: AnalogYear): number {
  let best = 0;
  let bestError = Infinity;
  for (let s = -MAX_SHIFT_DAYS; s <= MAX_SHIFT_DAYS; s += SHIFT_STEP) {
    let error = 0;
    const pace = (a.total + 1e-9) / (b.total + 1e-9);
    for (let w = 0; w < YEAR_DAYS - WEEK; w += WEEK) {
      const sa = analogSum(a, w, w + WEEK);
      const sb = analogSum(b, w - s, w + WEEK - s);
      error += (sa - pace * sb) ** 2;
    }
    error += 1e-9 * s * s; // ties go to the smaller shift
    if (error < bestError) [best, bestError] = [s, error];
  }
  return best;
}

/** Sd of the season start between past years, days: shrunk towards the prior with two pseudo-years. */
export function shiftSpread(years: AnalogYear[]): number {
  const shifts: number[] = [];
  for (let k = 1; k < years.length; k++) shifts.push(shiftBetween(years[k - 1], years[k]));
  const prior = 2 * SHIFT_PRIOR_SD_DAYS ** 2;
  return Math.sqrt((shifts.reduce((s, d) => s + d * d, 0) + prior) / (shifts.length + 2));
}

/** Lognormal sd of the past years' totals, shrunk towards the prior with two pseudo-years. */
export function paceSpread(years: AnalogYear[]): number {
  const logs = years.filter((y) => y.total > 0).map((y) => Math.log(y.total));
  const mean = logs.reduce((s, v) => s + v, 0) / Math.max(1, logs.length);
  const squares = logs.reduce((s, v) => s + (v - mean) ** 2, 0);
  return Math.sqrt((squares + 2 * PACE_PRIOR_SD ** 2) / (Math.max(0, logs.length - 1) + 2));
}

const clampPace = (p: number) => Math.min(PACE_LIMITS.max, Math.max(PACE_LIMITS.min, p));

/**
 * The scenarios (past year × shift) with their pace and weight (summing to 1), from the readings
 * sorted by day and their past years. `shiftSd` is the season-start spread (days).
 */
export function weighScenarios(
  sorted: ReadingPoint[],
  years: AnalogYear[],
  shiftSd: number,
  plannedUse: number | null = null,
): Scenario[] {
  const recent = weekSums(recentUse(sorted, EVIDENCE_DAYS));
  const scenarios: (Scenario & { logWeight: number })[] = [];
  years.forEach((year, k) => {
    const average = year.total / YEAR_DAYS;
    const pseudo = 14 * average + 1e-6;
    for (let shift = -MAX_SHIFT_DAYS; shift <= MAX_SHIFT_DAYS; shift += SHIFT_STEP) {
      const past: (number | null)[] = [];
      for (let j = -EVIDENCE_DAYS; j < 0; j++) {
        const at = j - shift;
        past.push(at < -year.lead || !year.known[at + year.lead] ? null : analogUse(year, at));
      }
      const analog = weekSums(past);
      let actualSum = 0;
      let analogSum = 0;
      recent.forEach((a, w) => {
        if (a === null || analog[w] === null) return;
        actualSum += a;
        analogSum += analog[w]!;
      });
      // without this year's evidence the pace is the plan's against that year's use (or ×1)
      const prior = plannedUse !== null && year.total > 0 ? clampPace(plannedUse / year.total) : 1;
      const pace = clampPace((actualSum + pseudo * prior) / (analogSum + pseudo));
      let misfit = 0;
      recent.forEach((a, w) => {
        const b = analog[w];
        if (a === null || b === null) return;
        const expected = pace * b;
        // weekly use varies by about 30 % of itself (rain, breakdowns) plus a tenth of an average week
        const sd2 = (0.3 * expected) ** 2 + (0.3 * a) ** 2 + (0.1 * WEEK * average) ** 2 + 1e-6;
        misfit += Math.min(MISFIT_CAP, (a - expected) ** 2 / sd2);
      });
      const logWeight =
        k * Math.log(OLDER_YEAR_WEIGHT) - (shift * shift) / (2 * shiftSd * shiftSd) - misfit / 2;
      const evidence = analogSum / (analogSum + pseudo);
      scenarios.push({ year, shift, pace, evidence, weight: 0, logWeight });
    }
  });
  const top = Math.max(...scenarios.map((s) => s.logWeight));
  let total = 0;
  for (const s of scenarios) total += s.weight = Math.exp(s.logWeight - top);
  // the likeliest scenarios that hold 99.9 % of the weight (at most 80), weights summing to 1
  scenarios.sort((a, b) => b.weight - a.weight);
  const kept: Scenario[] = [];
  let held = 0;
  for (const { logWeight: _drop, ...s } of scenarios) {
    if (held >= 0.999 * total || kept.length >= MAX_SCENARIOS) break;
    held += s.weight;
    kept.push(s);
  }
  return kept.map((s) => ({ ...s, weight: s.weight / held }));
}
