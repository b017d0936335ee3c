// Hours of an implement without a meter of its own, from the hitch log (issue 13): the sum, over
// the spans it was hitched, of the tractor meter's rise inside each span. A span edge rarely falls
// on a reading, so the tractor's value there is interpolated linearly between the readings either
// side; before the tractor's first reading nothing is known to have run (its first value holds),
// after its last reading nothing more is known yet (its last value holds), so an open span runs to
// the tractor's last reading. Values are lifetime values, continuous across a meter replacement.

/** One tractor reading: when (epoch ms) and its lifetime value (hours). */
export interface TractorReadingPoint {
  takenAtMs: number;
  lifetime: number;
}

/**
 * One span of the implement on a tractor: start and end (epoch ms; end null = still hitched) and
 * the readings of the tractor's meter it counts from, in any order — at least those inside the
 * span and the nearest one either side of it (more do no harm).
 */
export interface HitchSpanHours {
  startMs: number;
  endMs: number | null;
  readings: TractorReadingPoint[];
}

/** A reading of the implement's hitch hours: when (epoch ms) and its value (hours). */
export interface HitchReadingPoint {
  takenAtMs: number;
  value: number;
}

const byTime = (a: TractorReadingPoint, b: TractorReadingPoint) =>
  a.takenAtMs - b.takenAtMs || a.lifetime - b.lifetime;

/**
 * The tractor meter's lifetime value (hours) at `atMs` (epoch ms): linear between the readings
 * either side, the first value before the first reading, the last after the last; null without
 * readings. Of several readings at one instant the highest counts.
 */
export function meterValueAt(readings: TractorReadingPoint[], atMs: number): number | null {
  if (!readings.length) return null;
  const sorted = [...readings].sort(byTime);
  let before: TractorReadingPoint | undefined;
  let after: TractorReadingPoint | undefined;
  for (const r of sorted) {
    if (r.takenAtMs <= atMs) before = r;
    else {
      after = r;
      break;
    }
  }
  if (!before) return sorted[0].lifetime;
  if (!after) return before.lifetime;
  const share = (atMs - before.takenAtMs) / (after.takenAtMs - before.takenAtMs);
  return before.lifetime + share * (after.lifetime - before.lifetime);
}

/**
 * Hours (≥ 0) the implement gained in one span up to `untilMs` (epoch ms): the tractor meter's
 * rise from the span's start to its end (an open span: to `untilMs`), cut at `untilMs`.
 */
export function spanHoursUntil(span: HitchSpanHours, untilMs: number): number {
  const endMs = Math.min(span.endMs ?? untilMs, untilMs);
  if (endMs <= span.startMs) return 0;
  const start = meterValueAt(span.readings, span.startMs);
  const end = meterValueAt(span.readings, endMs);
  if (start === null || end === null) return 0;
  return Math.max(0, end - start);
}

/** The implement's hitch hours up to `atMs` (epoch ms): the sum of every span's hours until then. */
export function hitchHoursAt(spans: HitchSpanHours[], atMs: number): number {
  return spans.reduce((sum, span) => sum + spanHoursUntil(span, atMs), 0);
}

/**
 * The readings that carry the implement's hitch hours to its forecast, each `base` + the hours up
 * to its instant: one at each tractor reading inside a span (after its start, up to its end or,
 * while hitched, `nowMs`) and one at each span's end; one per instant, oldest first. `base` is the
 * implement's own last value before its first span (0 for one that never had a meter).
 */
export function hitchReadingPoints(
  spans: HitchSpanHours[],
  base: number,
  nowMs: number,
): HitchReadingPoint[] {
  const instants = new Set<number>();
  for (const span of spans) {
    const lastMs = span.endMs ?? nowMs;
    for (const r of span.readings) {
      if (r.takenAtMs > span.startMs && r.takenAtMs <= lastMs) instants.add(r.takenAtMs);
    }
    if (span.endMs !== null && span.endMs <= nowMs) instants.add(span.endMs);
  }
  return [...instants]
    .sort((a, b) => a - b)
    .map((takenAtMs) => ({ takenAtMs, value: base + hitchHoursAt(spans, takenAtMs) }));
}
