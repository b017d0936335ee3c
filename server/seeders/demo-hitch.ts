// The demo's hitch log (issue 13, implements without meters): Larkspur's rotary cutter RC-01 has
// no hour counter; it runs on T-02's PTO, a few days at a time from May to November (pasture,
// ditch banks, stalks after harvest), and is on T-02 now. Its hours are T-02's PTO hours over
// those spans, kept as its readings with source 'hitch' — worked out here with the same function
// the server uses (shared/domain/hitch-hours.ts), so the server's own recompute finds nothing to
// change (tests/server/demo-meters.test.ts).
import { localDayNumber, isoFromDayNumber } from '../../shared/domain';
import { hitchReadingPoints, type HitchSpanHours } from '../../shared/domain/hitch-hours';
import type { HitchMeterKind } from '../../shared/schemas/hitch';
import type { DemoReading } from './demo-readings';
import { createRandom, seedFromString } from './random';

export interface DemoHitch {
  implement: string;
  tractor: string;
  meterKind: HitchMeterKind;
  /** months (1–12) the implement works */
  months: number[];
}

/** The demo's implements on the hitch log. */
export const DEMO_HITCHES: DemoHitch[] = [
  { implement: 'RC-01', tractor: 'T-02', meterKind: 'pto_hours', months: [5, 6, 7, 8, 9, 10, 11] },
];

export interface DemoSpan {
  startedAt: Date;
  /** null: still hitched */
  endedAt: Date | null;
}

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/**
 * The spans of one implement from its tractor's typed readings, oldest first: now and then a span
 * from an hour after one reading to half an hour before a reading 1–3 readings later, in the
 * implement's months, a week or more apart; and an open span from just after the tractor's
 * third-last reading (or six days ago, whichever is later).
 */
export function planSpans(
  hitch: DemoHitch,
  tractorReadings: DemoReading[],
  timeZone: string,
  today: Date,
): DemoSpan[] {
  const typed = tractorReadings.filter((r) => r.source === 'manual');
  if (typed.length < 12) return [];
  const rng = createRandom(seedFromString(`hourstone-demo/hitch/${hitch.implement}`));
  const openStart = Math.max(
    typed[typed.length - 3].takenAt.getTime() + 1.5 * HOUR,
    today.getTime() - 6 * DAY,
  );
  const spans: DemoSpan[] = [];
  const monthOf = (at: Date) => Number(isoFromDayNumber(localDayNumber(at, timeZone)).slice(5, 7));
  let lastEnd = 0;
  for (let i = 3; i < typed.length - 4; i += 1) {
    const from = typed[i];
    if (!hitch.months.includes(monthOf(from.takenAt)) || !rng.chance(0.15)) continue;
    const to = typed[Math.min(i + rng.int(1, 3), typed.length - 1)];
    const startMs = from.takenAt.getTime() + HOUR;
    const endMs = to.takenAt.getTime() - 0.5 * HOUR;
    if (startMs - lastEnd < 7 * DAY || endMs <= startMs || endMs > openStart - 7 * DAY) continue;
    spans.push({ startedAt: new Date(startMs), endedAt: new Date(endMs) });
    lastEnd = endMs;
  }
  spans.push({ startedAt: new Date(openStart), endedAt: null });
  return spans;
}

/** How much (0–1) of [fromMs, toMs] the spans cover (an open span to `nowMs`). */
export function coveredShare(spans: DemoSpan[], fromMs: number, toMs: number, nowMs: number) {
  if (toMs <= fromMs) return 0;
  let covered = 0;
  for (const s of spans) {
    const a = Math.max(fromMs, s.startedAt.getTime());
    const b = Math.min(toMs, s.endedAt?.getTime() ?? nowMs);
    if (b > a) covered += b - a;
  }
  return Math.min(1, covered / (toMs - fromMs));
}

/**
 * Each span with the tractor meter's readings its hours need (those inside it and the nearest
 * either side), as the server reads them.
 */
function spanInputs(spans: DemoSpan[], meter: DemoReading[]): HitchSpanHours[] {
  return spans.map((s) => {
    const startMs = s.startedAt.getTime();
    const endMs = s.endedAt?.getTime() ?? Infinity;
    const inside = meter.filter(
      (r) => r.takenAt.getTime() >= startMs && r.takenAt.getTime() <= endMs,
    );
    const before = meter.findLast((r) => r.takenAt.getTime() < startMs);
    const after = meter.find((r) => r.takenAt.getTime() > endMs);
    return {
      startMs,
      endMs: s.endedAt?.getTime() ?? null,
      readings: [before, ...inside, after]
        .filter((r): r is DemoReading => r !== undefined)
        .map((r) => ({ takenAtMs: r.takenAt.getTime(), lifetime: r.lifetimeValue })),
    };
  });
}

const twoDecimals = (v: number) => Math.round(v * 100) / 100;

/**
 * The implement's readings from its spans and the tractor meter's readings (oldest first): base 0,
 * as it never had a meter; each entered when the tractor's reading at that instant was, by whom
 * it was (a span's end: at that time, by nobody).
 */
export function hitchReadings(spans: DemoSpan[], meter: DemoReading[], today: Date): DemoReading[] {
  const byTime = new Map(meter.map((r) => [r.takenAt.getTime(), r]));
  return hitchReadingPoints(spanInputs(spans, meter), 0, today.getTime()).map((p) => {
    const tractor = byTime.get(p.takenAtMs);
    const value = twoDecimals(p.value);
    return {
      value,
      lifetimeValue: value,
      takenAt: new Date(p.takenAtMs),
      createdAt: tractor?.createdAt ?? new Date(p.takenAtMs),
      source: 'hitch',
      enteredBy: tractor?.enteredBy ?? null,
    };
  });
}
