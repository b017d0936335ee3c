// The demo fleet (server/seeders) as a backtest for `npm run bench:forecast-accuracy`: each demo
// machine's generated readings over four years (the seeder's generator, its own seed), cut off at
// days spread over the last year; the truth after a cut is read off the later readings (linear
// between them). Invented data: the demo world of SCENARIO.md.
import { DEMO_MACHINES } from '../../server/seeders/demo-fleet';
import { generateReadings } from '../../server/seeders/readings-generator';
import { seedFromString } from '../../server/seeders/random';
import { localDayNumber, type ReadingPoint } from '../../shared/domain';
import { lifetimeValueAt } from '../../shared/domain/usage-season';

const YEARS = 4;
const ZONES = { larkspur: 'America/Chicago', osier: 'Europe/Dublin' } as const;

export interface DemoBacktest {
  fleetNumber: string;
  seasonMonths: number[];
  /** every reading as a day point (local day number, lifetime value), sorted */
  points: ReadingPoint[];
}

/** Each demo machine's four years of readings as day points, ending `today`. */
export function demoBacktests(today: Date): DemoBacktest[] {
  return DEMO_MACHINES.map((m) => {
    const timeZone = ZONES[m.organization];
    const generated = generateReadings({
      seed: seedFromString(`hourstone-accuracy/${m.organization}/${m.fleetNumber}`),
      start: new Date(today.getTime() - YEARS * 365 * 86_400_000),
      end: today,
      timeZone,
      season: m.season,
      ratePerDay: m.perYear / 365,
      endValue: m.aboutNow,
      meterUnit: m.meterUnit,
      inSeasonEvery: m.inSeasonEvery,
    });
    const points = generated
      .map((r) => ({ day: localDayNumber(r.takenAt, timeZone), value: r.value }))
      .sort((a, b) => a.day - b.day);
    return { fleetNumber: m.fleetNumber, seasonMonths: m.season.months, points };
  });
}

/** The day number the readings after `cut` first reach `target` (linear between them), or null. */
export function demoTruthDay(points: ReadingPoint[], cut: number, target: number): number | null {
  const after = points.findIndex((p) => p.day >= cut && p.value >= target);
  if (after <= 0) return null;
  const a = points[after - 1];
  const b = points[after];
  if (b.value === a.value) return b.day;
  const day = a.day + ((target - a.value) * (b.day - a.day)) / (b.value - a.value);
  return Math.max(cut, day);
}

/** A year's use before the cut, meter units (what a target's share is taken of). */
export function yearUseBefore(points: ReadingPoint[], cut: number): number {
  return lifetimeValueAt(points, cut) - lifetimeValueAt(points, cut - 365);
}
