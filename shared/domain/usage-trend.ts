// The 'trend' usage method: recency-weighted least squares over a window of readings.
// See usage.ts for the method as a whole.
import type { ReadingPoint, UsageEstimate } from './types';

/** Recency weight 2^(-age / half-life), age and half-life in days; half-life Infinity gives 1. */
export function recencyWeight(ageDays: number, halfLifeDays: number): number {
  return Math.pow(2, -Math.max(0, ageDays) / halfLifeDays);
}

/** Slope in value units per day of the weighted least-squares line through points (day, value). */
export function weightedSlope(points: ReadingPoint[], weights: number[]): number {
  if (points.length === 0) return 0;
  // Work relative to the first point: an unmoved meter then sums exact zeros (slope exactly 0),
  // and large day numbers and lifetime values lose no precision.
  const x0 = points[0].day;
  const y0 = points[0].value;
  let sw = 0;
  let sx = 0;
  let sy = 0;
  points.forEach((p, i) => {
    sw += weights[i];
    sx += weights[i] * (p.day - x0);
    sy += weights[i] * (p.value - y0);
  });
  if (!(sw > 0)) return 0;
  const mx = sx / sw;
  const my = sy / sw;
  let sxy = 0;
  let sxx = 0;
  points.forEach((p, i) => {
    const dx = p.day - x0 - mx;
    sxy += weights[i] * dx * (p.value - y0 - my);
    sxx += weights[i] * dx * dx;
  });
  return sxx > 0 ? sxy / sxx : 0;
}

/** Weighted quantile (0…1) of values: the smallest value whose cumulative weight reaches q. */
export function weightedQuantile(values: number[], weights: number[], q: number): number {
  const pairs = values.map((v, i) => ({ v, w: weights[i] })).filter((p) => p.w > 0);
  if (pairs.length === 0) return 0;
  pairs.sort((a, b) => a.v - b.v);
  const total = pairs.reduce((s, p) => s + p.w, 0);
  let cumulative = 0;
  for (const p of pairs) {
    cumulative += p.w;
    // A small tolerance so that q = 0.2 of five equal weights lands on the first, not the second.
    if (cumulative >= q * total * (1 - 1e-12)) return p.v;
  }
  return pairs[pairs.length - 1].v;
}

/**
 * Readings the trend rests on: those of the last windowDays before asOf; when fewer than two
 * (or they span less than a day) it reaches back to earlier readings until two span a day.
 */
function trendReadings(sorted: ReadingPoint[], asOfDay: number, windowDays: number) {
  const last = sorted[sorted.length - 1];
  let start = sorted.findIndex((r) => r.day >= asOfDay - windowDays);
  if (start === -1) start = sorted.length;
  let inWindow = true;
  while (start > 0 && (sorted.length - start < 2 || last.day - sorted[start].day < 1)) {
    start -= 1;
    inWindow = false;
  }
  return { points: sorted.slice(start), inWindow };
}

/** Trend usage estimate (units per day) from readings sorted by day spanning at least a day. */
export function estimateTrend(
  sorted: ReadingPoint[],
  asOfDay: number,
  windowDays: number,
  halfLifeDays: number,
): UsageEstimate {
  const { points, inWindow } = trendReadings(sorted, asOfDay, windowDays);
  // Ages are taken from the later of asOf and the newest reading: only the ratios of weights
  // matter, and this keeps very old readings from underflowing to zero weight.
  const reference = Math.max(asOfDay, points[points.length - 1].day);
  const weights = points.map((p) => recencyWeight(reference - p.day, halfLifeDays));
  const rate = Math.max(0, weightedSlope(points, weights));

  const intervalRates: number[] = [];
  const intervalWeights: number[] = [];
  for (let i = 1; i < points.length; i += 1) {
    const span = points[i].day - points[i - 1].day;
    if (span <= 0) continue;
    const middle = (points[i].day + points[i - 1].day) / 2;
    intervalRates.push(Math.max(0, (points[i].value - points[i - 1].value) / span));
    intervalWeights.push(span * recencyWeight(reference - middle, halfLifeDays));
  }
  const low = Math.min(weightedQuantile(intervalRates, intervalWeights, 0.2), rate);
  const high = Math.max(weightedQuantile(intervalRates, intervalWeights, 0.8), rate);

  const last = points[points.length - 1];
  const weighting = Number.isFinite(halfLifeDays)
    ? 'recent weeks weighted most'
    : 'all readings weighted equally';
  const explanation = inWindow
    ? `Trend of ${points.length} readings over the last ${windowDays} days, ${weighting}`
    : `Trend of the last ${points.length} readings (too few in the last ${windowDays} days), ${weighting}`;
  return {
    method: 'trend',
    rate,
    low,
    high,
    readingCount: points.length,
    lastDay: last.day,
    lastValue: last.value,
    anchorDay: last.day,
    anchorValue: last.value,
    explanation,
  };
}
