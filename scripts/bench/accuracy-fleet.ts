// A synthetic fleet whose future is known, for `npm run bench:forecast-accuracy`: each machine's
// daily use is simulated over four years and a half, so a forecast made from the readings before a
// cut-off day can be compared with the day its meter really reached a value. Invented data (no
// machine of the demo or of any maker); the patterns are common practice on arable farms:
// - harvest: one season a year (a combine), its start moving ±10 days (sd) with the weather and
//   its pace ±15 % (sd) from year to year, rain days idle;
// - two-season: spring and autumn work (a tillage tractor) with light yard use between;
// - year-round: weekday use (a loader), ±10 % a year;
// - custom-hire: a few bursts of long days at random times of the year on light base use;
// - young: a harvest machine first read 200 days before the cut-off, its season months entered.
import { mulberry32 } from '../../server/seeders/random';
import type { ReadingPoint } from '../../shared/domain';

export type FleetKind = 'harvest' | 'two-season' | 'year-round' | 'custom-hire' | 'young';
export const FLEET_KINDS: FleetKind[] = [
  'harvest',
  'two-season',
  'year-round',
  'custom-hire',
  'young',
];

export interface SimMachine {
  id: string;
  kind: FleetKind;
  /** day number of day 0 of `use` */
  startDay: number;
  /** true use per day (meter units), index 0 = startDay */
  use: number[];
  /** the months (1–12) a manager would enter for its season; [] = all year */
  seasonMonths: number[];
  /** first day number its readings exist from */
  firstReadDay: number;
}

const YEAR = 365;
export const SIM_YEARS = 4.5;

function normal(rand: () => number): number {
  // Box–Muller
  const u = Math.max(rand(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
}

function spell(use: number[], from: number, length: number, pace: number, rand: () => number) {
  for (let d = Math.max(0, Math.round(from)); d < Math.min(use.length, from + length); d++) {
    if (rand() < 0.2) continue; // a rain day or a breakdown
    use[d] += pace * (0.6 + 0.8 * rand());
  }
}

/** One simulated machine; startDay is a 1 January's day number. */
export function simulate(kind: FleetKind, seed: number, startDay: number): SimMachine {
  const rand = mulberry32(seed);
  const days = Math.round(SIM_YEARS * YEAR);
  const use = new Array<number>(days).fill(0);
  const years = Math.ceil(SIM_YEARS);
  let seasonMonths: number[] = [];
  for (let y = 0; y < years; y++) {
    const jan1 = y * YEAR;
    const pace = Math.exp(0.15 * normal(rand));
    if (kind === 'harvest' || kind === 'young') {
      seasonMonths = [7, 8, 9];
      const start = 200 + 10 * normal(rand);
      spell(use, jan1 + start, 45 + 6 * normal(rand), 9 * pace, rand);
    } else if (kind === 'two-season') {
      seasonMonths = [3, 4, 5, 9, 10];
      spell(use, jan1 + 80 + 10 * normal(rand), 40, 6 * pace, rand);
      spell(use, jan1 + 250 + 10 * normal(rand), 40, 6 * pace, rand);
      for (let d = jan1; d < Math.min(days, jan1 + YEAR); d++) if (rand() < 0.4) use[d] += 0.8;
    } else if (kind === 'year-round') {
      const factor = Math.exp(0.1 * normal(rand));
      for (let d = jan1; d < Math.min(days, jan1 + YEAR); d++)
        if ((startDay + d + 4) % 7 < 5) use[d] += 4 * factor * (0.5 + rand());
    } else {
      for (let d = jan1; d < Math.min(days, jan1 + YEAR); d++) use[d] += 0.3 * rand();
      const bursts = 3 + Math.floor(rand() * 4);
      for (let b = 0; b < bursts; b++) spell(use, jan1 + rand() * YEAR, 5 + rand() * 10, 10, rand);
    }
  }
  return { id: `${kind}-${seed}`, kind, startDay, use, seasonMonths, firstReadDay: startDay };
}

/** Lifetime value at the end of each simulated day (index d = after day d's use). */
export function lifetimeCurve(m: SimMachine): number[] {
  const out: number[] = [];
  let total = 100;
  for (const u of m.use) out.push((total += u));
  return out;
}

/**
 * The readings a farm would have logged before cutDay (exclusive), as daily end-of-day points
 * (day + 0.75, the summary's form): most working days, few idle ones.
 */
export function readingsBefore(m: SimMachine, curve: number[], cutDay: number, seed: number) {
  const rand = mulberry32(seed);
  const points: ReadingPoint[] = [];
  const from = Math.max(0, m.firstReadDay - m.startDay);
  for (let d = from; d < cutDay - m.startDay && d < curve.length; d++) {
    const logged = d === from || rand() < (m.use[d] > 0.5 ? 0.6 : 0.06);
    if (logged) points.push({ day: m.startDay + d + 0.75, value: Math.round(curve[d] * 10) / 10 });
  }
  return points;
}

/** Fractional day number the lifetime curve first reaches target after cutDay, or null. */
export function trueDayOf(m: SimMachine, curve: number[], cutDay: number, target: number) {
  for (let d = Math.max(0, cutDay - m.startDay); d < curve.length; d++) {
    if (curve[d] >= target) {
      const before = d === 0 ? 100 : curve[d - 1];
      const fraction = m.use[d] > 0 ? (target - before) / m.use[d] : 1;
      return m.startDay + d + Math.min(1, Math.max(0, fraction));
    }
  }
  return null;
}

/** A fleet of n machines of each kind, seeded from `seed`. */
export function simulatedFleet(perKind: number, seed: number, startDay: number): SimMachine[] {
  const fleet: SimMachine[] = [];
  FLEET_KINDS.forEach((kind, k) => {
    for (let i = 0; i < perKind; i++) {
      const m = simulate(kind, seed * 1000 + k * 100 + i, startDay);
      fleet.push(m);
    }
  });
  return fleet;
}
