// Lifetime meter values. When an hour meter is replaced, the new meter starts again (often at 0);
// adding every earlier replacement's (old final − new start) keeps the machine's hours continuous,
// so forecasts and due points work on one unbroken curve.

/** A meter replacement: when (epoch ms), the old meter's final value and the new one's start (meter units). */
export interface MeterReplacementPoint {
  replacedAtMs: number;
  oldFinalValue: number;
  newStartValue: number;
}

/**
 * Offset in meter units to add to a raw reading taken at takenAtMs (epoch ms): the sum of
 * (old final − new start) over replacements at or before that instant (a reading at the very
 * instant of a replacement is on the new meter).
 */
export function lifetimeOffset(takenAtMs: number, replacements: MeterReplacementPoint[]): number {
  return replacements
    .filter((r) => r.replacedAtMs <= takenAtMs)
    .reduce((sum, r) => sum + (r.oldFinalValue - r.newStartValue), 0);
}

/** Lifetime value (meter units) of a raw meter reading taken at takenAtMs (epoch ms). */
export function toLifetimeValue(
  raw: number,
  takenAtMs: number,
  replacements: MeterReplacementPoint[],
): number {
  return raw + lifetimeOffset(takenAtMs, replacements);
}

/** Raw value (meter units) the meter in place at takenAtMs (epoch ms) shows for a lifetime value. */
export function toRawValue(
  lifetime: number,
  takenAtMs: number,
  replacements: MeterReplacementPoint[],
): number {
  return lifetime - lifetimeOffset(takenAtMs, replacements);
}
