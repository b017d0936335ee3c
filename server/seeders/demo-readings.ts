// The demo's meter readings per machine: the generated history, who typed each one in, the one
// hour-meter replacement (T-03) and the one bale-counter reset (B-01), after which the meter
// shows values from 0 again while the lifetime value runs on.
import type { ReadingSource } from '../../shared/constants';
import { generateReadings } from './readings-generator';
import type { DemoMachine } from './demo-machine';
import { createRandom, seedFromString } from './random';

/** Days of history before the demo's "today": a little over two years, so a season repeats twice. */
export const HISTORY_DAYS = 800;
const MS_PER_DAY = 86_400_000;

export interface DemoReading {
  value: number;
  lifetimeValue: number;
  takenAt: Date;
  createdAt: Date;
  source: ReadingSource;
  enteredBy: string | null;
}

export interface DemoReplacement {
  /** a new meter fitted, or the same counter zeroed */
  kind: 'replacement' | 'reset';
  replacedAt: Date;
  oldFinalValue: number;
  newStartValue: number;
  note: string;
  enteredBy: string | null;
}

export interface MachineReadings {
  readings: DemoReading[];
  replacement: DemoReplacement | null;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/**
 * Readings of one machine ending on `today`, deterministic for its fleet number. enteredBy picks
 * among the given user ids; replaceDaysAgo (days) fits a new meter that starts at 0.
 */
export function buildMachineReadings(
  machine: DemoMachine,
  opts: {
    today: Date;
    timeZone: string;
    enteredBy: string[];
    technician: string | null;
    replaceDaysAgo?: number;
    /** days ago the counter was zeroed (a reset, recorded like a replacement) */
    reset?: { daysAgo: number; note: string };
  },
): MachineReadings {
  const seed = seedFromString(`hourstone-demo/${machine.organization}/${machine.fleetNumber}`);
  const generated = generateReadings({
    seed,
    start: new Date(opts.today.getTime() - HISTORY_DAYS * MS_PER_DAY),
    end: opts.today,
    timeZone: opts.timeZone,
    season: machine.season,
    ratePerDay: machine.perYear / 365,
    endValue: machine.aboutNow,
    meterUnit: machine.meterUnit,
    inSeasonEvery: machine.inSeasonEvery,
  });
  const rng = createRandom(seed ^ 0x5eed);
  const readings: DemoReading[] = generated.map((r) => ({
    value: r.value,
    lifetimeValue: r.value,
    takenAt: r.takenAt,
    createdAt: r.enteredAt,
    source: 'manual',
    enteredBy: opts.enteredBy.length ? rng.pick(opts.enteredBy) : null,
  }));
  if (opts.reset)
    return replaceMeter(readings, opts.today.getTime() - opts.reset.daysAgo * MS_PER_DAY, {
      kind: 'reset',
      note: opts.reset.note,
      enteredBy: opts.enteredBy.length ? rng.pick(opts.enteredBy) : null,
    });
  if (opts.replaceDaysAgo === undefined) return { readings, replacement: null };
  return replaceMeter(readings, opts.today.getTime() - opts.replaceDaysAgo * MS_PER_DAY, {
    kind: 'replacement',
    note: 'Hour meter stopped counting; new meter fitted, starting at 0 h.',
    enteredBy: opts.technician,
  });
}

/**
 * Fits a new meter, or zeroes the counter (starting at 0), just after the last reading before
 * `atMs`: the old count's final value is that reading's; later readings show value = lifetime −
 * (old final − new start).
 */
function replaceMeter(
  readings: DemoReading[],
  atMs: number,
  change: Pick<DemoReplacement, 'kind' | 'note' | 'enteredBy'>,
): MachineReadings {
  const lastOld = readings.findLastIndex((r) => r.takenAt.getTime() <= atMs);
  if (lastOld < 0 || lastOld === readings.length - 1) return { readings, replacement: null };
  const failed = readings[lastOld];
  const replacedAt = new Date(failed.takenAt.getTime() + 45 * 60_000);
  const oldFinalValue = failed.lifetimeValue;
  const replacement: DemoReplacement = { ...change, replacedAt, oldFinalValue, newStartValue: 0 };
  const fitted: DemoReading = {
    value: 0,
    lifetimeValue: oldFinalValue,
    takenAt: replacedAt,
    createdAt: replacedAt,
    source: 'service',
    enteredBy: change.enteredBy,
  };
  const after = readings.slice(lastOld + 1).map((r) => ({
    ...r,
    value: round1(r.lifetimeValue - oldFinalValue),
  }));
  return { readings: [...readings.slice(0, lastOld + 1), fitted, ...after], replacement };
}
