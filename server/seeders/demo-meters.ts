// The demo's meters beside each machine's primary one (issue 13): the combine's separator hours
// and the PTO hours of the tractors that drive implements. The operator reads them with the
// engine hours, so each has a reading at every typed engine reading; it rises by a share of the
// engine's rise (drawn per interval), so it never runs ahead of the engine. T-02's PTO share is
// higher while the rotary cutter is on it (demo-hitch.ts), as the cutter runs on its PTO.
import type { MeterKind } from '../../shared/constants';
import type { DemoReading } from './demo-readings';
import { createRandom, seedFromString } from './random';

export interface DemoExtraMeter {
  fleetNumber: string;
  kind: MeterKind;
  /** the meter's lifetime value at the first engine reading, as a share of the engine's */
  startShare: number;
  /** the share of each interval's engine rise the meter counts, [low, high] */
  share: [number, number];
}

/** Meters beside the primary one. */
export const DEMO_EXTRA_METERS: DemoExtraMeter[] = [
  // threshing runs most of the engine's time in harvest, not while driving to the field
  { fleetNumber: 'C-01', kind: 'separator_hours', startShare: 0.74, share: [0.68, 0.84] },
  // T-02 drives the rotary cutter (demo-hitch.ts) and the odd PTO job
  { fleetNumber: 'T-02', kind: 'pto_hours', startShare: 0.22, share: [0.1, 0.25] },
  // T-03's loader work needs no PTO; the post-hole digger and the yard sweeper do
  { fleetNumber: 'T-03', kind: 'pto_hours', startShare: 0.18, share: [0.08, 0.2] },
  // Osier Creek's loader tractor drives the mixer wagon every morning
  { fleetNumber: 'T-11', kind: 'pto_hours', startShare: 0.4, share: [0.35, 0.5] },
];

/** The bale counter zeroed once, and how long ago (days): the counter starts again at 0. */
export const COUNTER_RESET = {
  fleetNumber: 'B-01',
  daysAgo: 300,
  note: 'Bale counter zeroed at the winter service.',
} as const;

/** The stable name of a demo meter, for its id. */
export const demoMeterName = (organization: string, fleetNumber: string, kind: MeterKind) =>
  `meter/${organization}/${fleetNumber}/${kind}`;

const round1 = (n: number) => Math.round(n * 10) / 10;

/**
 * One extra meter's readings from the machine's primary readings (lifetime values): one at each
 * typed reading, rising by `share(i)` of the engine's rise into reading i. `coveredShare(from, to)`
 * (0–1, epoch ms) is how much of an interval an implement ran on the meter; that part counts at
 * 80–92% (a PTO implement keeps the PTO turning nearly all the time it is on).
 */
export function deriveMeterReadings(
  meter: DemoExtraMeter & { organization: string },
  primary: DemoReading[],
  coveredShare: (fromMs: number, toMs: number) => number = () => 0,
): DemoReading[] {
  const typed = primary.filter((r) => r.source === 'manual');
  if (!typed.length) return [];
  const rng = createRandom(
    seedFromString(demoMeterName(meter.organization, meter.fleetNumber, meter.kind)),
  );
  let value = typed[0].lifetimeValue * meter.startShare;
  return typed.map((r, i) => {
    if (i > 0) {
      const before = typed[i - 1];
      const rise = Math.max(0, r.lifetimeValue - before.lifetimeValue);
      const covered = coveredShare(before.takenAt.getTime(), r.takenAt.getTime());
      const share = covered * rng.between(0.8, 0.92) + (1 - covered) * rng.between(...meter.share);
      value += rise * share;
    }
    const v = round1(value);
    return { ...r, value: v, lifetimeValue: v };
  });
}
