// Plausibility rules for a new or edited meter reading, checked against its neighbours in time.
// Values are lifetime values (see lifetime.ts), so a meter replacement is not "going backwards".
// Each refusal names the rule, the field and the neighbouring reading, so the person entering it
// can see what to fix.
import type { MeterUnit } from '../constants';
import { isCountingUnit } from './meter-kinds';

/** A reading as the rules see it: lifetime value (meter units) and when it was taken (epoch ms). */
export interface ReadingAt {
  value: number;
  takenAtMs: number;
  /**
   * the value the meter fitted at the time showed (meter units), when a meter replacement makes it
   * differ from the lifetime value: messages then speak in it, lifetime in brackets
   */
  raw?: number;
}

/** Names of the reading rules. */
export type ReadingRule = 'backwards' | 'above_next' | 'future' | 'too_fast';

/** A broken rule: the field to show it beside, the rule, and a sentence for the person. */
export interface ReadingRuleViolation {
  field: 'value' | 'takenAt';
  rule: ReadingRule;
  message: string;
}

/** Options of checkReading: now and skew in epoch ms / ms, the meter unit, its maximum per day. */
export interface ReadingRuleOptions {
  nowMs: number;
  meterUnit: string;
  /** most the meter can advance per day, meter units (default DEFAULT_MAX_PER_DAY[meterUnit]) */
  maxPerDay?: number;
  /** clock skew tolerated between devices, ms (default 5 minutes) */
  skewMs?: number;
  /** how a reading's time is shown in messages (default: ISO 8601, UTC, to the minute) */
  formatTime?: (ms: number) => string;
}

/**
 * Most a meter can plausibly advance in a day, meter units per day (common practice, not from a
 * published source): 24 h for an hour meter is a hard limit; the others are generous
 * ceilings for one machine in one day. Miles are the km ceiling in miles (1,500 / 1.609344 =
 * 932.06), rounded down to 930: a grain truck shuttling all day stays well under it.
 */
export const DEFAULT_MAX_PER_DAY = {
  h: 24,
  km: 1500,
  mi: 930,
  bales: 2000,
  ha: 300,
  acres: 750,
} as const satisfies Record<string, number>;

/**
 * What a refused lower reading points to: a counter that was zeroed (or a meter that was swapped)
 * is recorded as such, and readings then run on from its new start (issue 13).
 */
export const BACKWARDS_HINT =
  'If the counter was reset, record it with “Counter was reset” when logging the reading (a new meter fitted: Record meter replacement).';
/** The same for a meter that is not zeroed in use (hours, distance, area): only a new meter. */
export const BACKWARDS_HINT_NOT_COUNTING =
  'If a new meter was fitted, record it with “Record meter replacement” on its meter.';

/** Default clock skew tolerated for the future and too-fast rules, ms (5 minutes). */
export const DEFAULT_SKEW_MS = 5 * 60 * 1000;

const MS_PER_DAY = 86_400_000;

function isoMinute(ms: number): string {
  return `${new Date(ms).toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

function formatValue(value: number, maximumFractionDigits = 3): string {
  return value.toLocaleString('en-US', { maximumFractionDigits });
}

/**
 * First rule a candidate reading breaks against its neighbours in time, or null when plausible.
 * Rules: future (taken after now + skew), backwards (below the previous value), above_next
 * (above the next value), too_fast (more than maxPerDay meter units per elapsed day to either side).
 */
export function checkReading(
  candidate: ReadingAt,
  neighbours: { previous?: ReadingAt; next?: ReadingAt },
  opts: ReadingRuleOptions,
): ReadingRuleViolation | null {
  const unit = opts.meterUnit;
  const skewMs = opts.skewMs ?? DEFAULT_SKEW_MS;
  const time = opts.formatTime ?? isoMinute;
  const known = DEFAULT_MAX_PER_DAY as Record<string, number>;
  const maxPerDay = opts.maxPerDay ?? known[unit] ?? Number.POSITIVE_INFINITY;
  const shown = (value: number) => `${formatValue(value)} ${unit}`;
  // "300 h (2,009.4 h lifetime)": as the person read it off the meter, lifetime in brackets
  const reading = (r: ReadingAt) =>
    r.raw === undefined || Math.abs(r.raw - r.value) < 1e-9
      ? shown(r.value)
      : `${shown(r.raw)} (${shown(r.value)} lifetime)`;
  const describe = (label: string, r: ReadingAt) =>
    `the ${label} reading of ${reading(r)} taken ${time(r.takenAtMs)}`;
  const { previous, next } = neighbours;

  if (candidate.takenAtMs > opts.nowMs + skewMs) {
    const context = previous ? `; ${describe('previous', previous)}` : '';
    return {
      field: 'takenAt',
      rule: 'future',
      message: `Reading time ${time(candidate.takenAtMs)} is in the future (now ${time(opts.nowMs)})${context} — readings may not be dated ahead of now.`,
    };
  }
  if (previous && candidate.value < previous.value) {
    return {
      field: 'value',
      rule: 'backwards',
      message: `Reading ${reading(candidate)} is lower than ${describe('previous', previous)} — readings may not go backwards. ${isCountingUnit(unit as MeterUnit) ? BACKWARDS_HINT : BACKWARDS_HINT_NOT_COUNTING}`,
    };
  }
  if (next && candidate.value > next.value) {
    return {
      field: 'value',
      rule: 'above_next',
      message: `Reading ${reading(candidate)} is higher than ${describe('next', next)} — a reading may not be above a later one.`,
    };
  }

  // Elapsed time gets the same skew allowance as the future rule, so two readings a few minutes
  // apart with clocks slightly off are not refused.
  const tooFast = (from: ReadingAt, to: ReadingAt) => {
    const elapsedMs = Math.max(0, to.takenAtMs - from.takenAtMs);
    const increase = to.value - from.value;
    return increase > (maxPerDay * (elapsedMs + skewMs)) / MS_PER_DAY
      ? { increase, elapsedMs }
      : null;
  };
  const pace = (increase: number, elapsedMs: number) =>
    elapsedMs > 0
      ? `${formatValue((increase * MS_PER_DAY) / elapsedMs, 1)} ${unit} per day`
      : `${shown(increase)} with no time elapsed`;
  // a function: formatting costs a number formatter, and most readings break no rule
  const limit = () =>
    `more than the ${formatValue(maxPerDay)} ${unit} per day this meter can advance.`;

  const sincePrevious = previous ? tooFast(previous, candidate) : null;
  if (previous && sincePrevious) {
    return {
      field: 'value',
      rule: 'too_fast',
      message: `Reading ${reading(candidate)} implies ${pace(sincePrevious.increase, sincePrevious.elapsedMs)} since ${describe('previous', previous)} — ${limit()}`,
    };
  }
  const untilNext = next ? tooFast(candidate, next) : null;
  if (next && untilNext) {
    return {
      field: 'value',
      rule: 'too_fast',
      message: `Reading ${reading(candidate)} leaves ${pace(untilNext.increase, untilNext.elapsedMs)} until ${describe('next', next)} — ${limit()}`,
    };
  }
  return null;
}
