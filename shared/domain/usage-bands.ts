// From the weighted scenarios of usage-seasons.ts to what a due date is read from: three daily
// use profiles for the coming days whose running totals are the 10th, 50th and 90th percentiles
// (weighted, day by day) of the meter's rise across scenarios. Since every scenario's rise only
// grows, the day the 50th-percentile curve reaches a target is the median of the days the
// scenarios reach it, and the 90th and 10th curves give the earliest and latest of an 80 % range.
// Each scenario is split in three paces (×e^−√2σ, ×1, ×e^+√2σ, weights ¼, ½, ¼: the variance of a
// lognormal sd σ), σ being the year-to-year spread less what this year's use has shown.
import { analogSum, type Scenario } from './usage-seasons';

/** Running totals are taken every few days and joined by straight lines (days). */
const KNOT_DAYS = 4;
/** The least pace spread left once this year's use is known (lognormal sd; common practice). */
const PACE_FLOOR_SD = 0.15;
const PACE_SPLIT = [
  { z: -Math.SQRT2, weight: 0.25 },
  { z: 0, weight: 0.5 },
  { z: Math.SQRT2, weight: 0.25 },
];

export interface UsageBands {
  /** daily use whose running total is the median rise (index 0 = the day after the last reading) */
  point: number[];
  /** the 10th percentile: the slow side, latest dates */
  slow: number[];
  /** the 90th percentile: the fast side, earliest dates */
  fast: number[];
}

/** Weighted quantile q of values taken in the given order (ascending). */
function quantileOf(order: number[], values: number[], weights: number[], q: number): number {
  let cumulative = 0;
  for (const i of order) {
    cumulative += weights[i];
    if (cumulative >= q - 1e-12) return values[i];
  }
  return order.length ? values[order[order.length - 1]] : 0;
}

const round = (v: number) => Math.round(v * 1e4) / 1e4;

/** The three profiles over `days` coming days from scenarios whose weights sum to 1. */
export function usageBands(scenarios: Scenario[], days: number, paceSd: number): UsageBands {
  const knots: number[] = [];
  for (let t = 0; t < days; t += KNOT_DAYS) knots.push(t);
  knots.push(days);
  // each scenario's running total at the knots, at pace 1 of its own
  const totals = scenarios.map((s) => {
    return knots.map((t) => analogSum(s.year, -s.shift, t - s.shift));
  });
  const values: number[] = [];
  const factors: number[] = [];
  const weights: number[] = [];
  for (let i = 0; i < scenarios.length; i++) {
    const s = scenarios[i];
    const sd = Math.max(PACE_FLOOR_SD, paceSd * Math.sqrt(1 - s.evidence));
    for (const p of PACE_SPLIT) {
      factors.push(s.pace * Math.exp(p.z * sd));
      weights.push(s.weight * p.weight);
    }
  }
  const order = factors.map((_, i) => i);
  const curves = { point: [0], slow: [0], fast: [0] };
  for (let k = 1; k < knots.length; k++) {
    for (let v = 0; v < factors.length; v++)
      values[v] = totals[(v / PACE_SPLIT.length) | 0][k] * factors[v];
    // the order at the previous knot is nearly right: insertion sort finishes it cheaply
    for (let i = 1; i < order.length; i++) {
      const o = order[i];
      let j = i - 1;
      while (j >= 0 && values[order[j]] > values[o]) {
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = o;
    }
    curves.slow.push(quantileOf(order, values, weights, 0.1));
    curves.point.push(quantileOf(order, values, weights, 0.5));
    curves.fast.push(quantileOf(order, values, weights, 0.9));
  }
  const daily = (curve: number[]) => {
    const out: number[] = [];
    for (let k = 1; k < knots.length; k++) {
      const span = knots[k] - knots[k - 1];
      const each = round(Math.max(0, curve[k] - curve[k - 1]) / span);
      for (let d = 0; d < span; d++) out.push(each);
    }
    return out;
  };
  return { point: daily(curves.point), slow: daily(curves.slow), fast: daily(curves.fast) };
}
