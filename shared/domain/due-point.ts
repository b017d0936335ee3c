// Due point of one service task: the meter value and calendar date it falls due, the date the
// meter is projected to reach its due value, and the status that follows. The task is due at
// whichever comes first. Dates are local ISO dates (yyyy-mm-dd); meter values are lifetime values.
// A season service takes its date from the machine's season months (season-dates.ts) in place of
// a day interval, and may keep a meter interval: whichever comes first.
import { addDaysIso, dayNumberFromIso, daysBetweenIso, isoFromDayNumber } from './calendar';
import { beforePeak } from './due-before-peak';
import { dueOutcomes } from './due-outcomes';
import { seasonServiceDue } from './season-dates';
import type { DuePoint, DueSeason, DueStatus, TaskSchedule, UsageEstimate } from './types';

/** Furthest a projection reaches, days after asOf (three years); later means "not in sight". */
export const MAX_PROJECTION_DAYS = 3 * 365 + 1;
/** Default warning window as a fraction of the interval (dimensionless), rounded to whole units. */
export const DEFAULT_WARN_FRACTION = 0.1;
/** Default warning window of a season service, days: two weeks to book the work (common practice). */
export const DEFAULT_SEASON_WARN_DAYS = 14;

/** Which projection: the point estimate, the earliest date (high rate) or the latest (low rate). */
export type ProjectionVariant = 'point' | 'low' | 'high';

/** Day number at which the season profile, scaled by factor, carries value from start to target. */
function walkProfile(
  profile: number[],
  factor: number,
  startDay: number,
  startValue: number,
  target: number,
  maxSteps: number,
): number | null {
  let value = startValue;
  for (let i = 0; i < maxSteps; i += 1) {
    // The profile repeats with a year's period past its end (it is built that way).
    const index = i < profile.length ? i : profile.length >= 365 ? i % 365 : -1;
    if (index < 0) return null;
    const use = profile[index] * factor;
    if (use > 0 && value + use >= target) return startDay + i + (target - value) / use;
    value += use;
  }
  return null;
}

/**
 * ISO date the lifetime meter reaches target (meter units) from a usage estimate, never before
 * asOfDay; 'low' = earliest (high rate), 'high' = latest (low rate); null when the rate is 0, the
 * estimate is 'none', or the date lies more than three years after asOf.
 */
export function projectDateForValue(
  usage: UsageEstimate,
  target: number,
  asOfDay: number,
  variant: ProjectionVariant,
): string | null {
  if (usage.method === 'none' || usage.lastDay === null || usage.lastValue === null) return null;
  const anchorDay = usage.anchorDay ?? usage.lastDay;
  const anchorValue = usage.anchorValue ?? usage.lastValue;
  let day: number | null;
  if (target <= anchorValue) {
    day = anchorDay;
  } else if (usage.method === 'season' && usage.profile && usage.profile.length > 0) {
    const banded =
      variant === 'low' ? usage.profileFast : variant === 'high' ? usage.profileSlow : null;
    const scale = usage.scale && usage.scale > 0 ? usage.scale : 1;
    // profile = base × scale; low/high are base × max(scale,1) × 1.2 and base × min(scale,1) × 0.8.
    const factor =
      variant === 'point' || banded
        ? 1
        : variant === 'low'
          ? (Math.max(scale, 1) * 1.2) / scale
          : (Math.min(scale, 1) * 0.8) / scale;
    const steps = Math.ceil(asOfDay + MAX_PROJECTION_DAYS - anchorDay) + 1;
    day = walkProfile(banded ?? usage.profile, factor, anchorDay, anchorValue, target, steps);
  } else {
    const rate = variant === 'point' ? usage.rate : variant === 'low' ? usage.high : usage.low;
    day = rate > 0 ? anchorDay + (target - anchorValue) / rate : null;
  }
  if (day === null || day - asOfDay > MAX_PROJECTION_DAYS) return null;
  return isoFromDayNumber(Math.max(day, asOfDay));
}

/** An estimate under which the meter never moves: rate, range and season profile all zero. */
function notMoving(usage: UsageEstimate): boolean {
  return !(usage.rate > 0 || usage.high > 0 || (usage.profile ?? []).some((u) => u > 0));
}

interface MeterDue {
  value: number;
  basis: DuePoint['basis'];
}

/** Next due lifetime meter value of a task; current = lifetime value now (or null). */
function meterDue(task: TaskSchedule, current: number | null): MeterDue | null {
  const interval = task.intervalMeter;
  if (interval === null || !(interval > 0)) return null;
  if (task.lastDoneMeter !== null)
    return { value: task.lastDoneMeter + interval, basis: 'recorded' };
  const breakIn =
    task.firstServiceMeter !== null && task.firstServiceMeter > 0 ? task.firstServiceMeter : null;
  const countFrom = task.lastDoneOn === null ? (task.countFromMeter ?? null) : null;
  // A start counted from (in place of an unknown history) before the break-in point keeps it.
  if (countFrom !== null && !(breakIn !== null && breakIn > countFrom))
    return { value: countFrom + interval, basis: 'counted' };
  if (breakIn !== null) return { value: breakIn, basis: 'first_service' };
  // Never recorded: assume the schedule ran on multiples of the interval since new, so the next
  // one is the multiple at or above the meter (at least one interval).
  if (current === null) return { value: interval, basis: 'assumed' };
  return { value: Math.max(interval, Math.ceil(current / interval) * interval), basis: 'assumed' };
}

/** Next due calendar date (ISO) of a task, from the last service or else the machine's start. */
function calendarDue(task: TaskSchedule, machineStartIso: string | null): string | null {
  const interval = task.intervalDays;
  if (interval === null || !(interval > 0)) return null;
  if (task.lastDoneOn) return addDaysIso(task.lastDoneOn, interval);
  if (task.lastDoneMeter === null && task.countFromOn)
    return addDaysIso(task.countFromOn, interval);
  if (machineStartIso) return addDaysIso(machineStartIso, interval);
  return null;
}

/**
 * The season date of a season service. Never done, it counts from the start set in place of an
 * unknown history, else the machine's first reading, else today: the first season that starts
 * (pre-season) or ends (storage) on or after that date is due, as calendarDue counts a day
 * interval from the same start.
 */
function seasonDue(
  task: TaskSchedule,
  seasonMonths: readonly number[],
  machineStartIso: string | null,
  asOfIso: string,
): { dueDate: string | null; season: DueSeason } | null {
  const anchor = task.seasonAnchor ?? null;
  const offsetDays = task.seasonOffsetDays ?? null;
  if (anchor === null || offsetDays === null) return null;
  const countFrom =
    (task.lastDoneMeter === null ? task.countFromOn : null) ?? machineStartIso ?? asOfIso;
  const due = seasonServiceDue(seasonMonths, anchor, offsetDays, {
    lastDoneOn: task.lastDoneOn,
    countFrom,
  });
  const seasonDate = due ? (anchor === 'before_start' ? due.season.start : due.season.end) : null;
  return { dueDate: due?.dueDate ?? null, season: { anchor, offsetDays, seasonDate } };
}

function defaultWarn(explicit: number | null, interval: number | null): number | null {
  if (explicit !== null) return explicit;
  return interval !== null && interval > 0 ? Math.round(interval * DEFAULT_WARN_FRACTION) : null;
}

/** Whether a task's start is known: a last service, or a start someone set in its place. */
const neverRecorded = (task: TaskSchedule) =>
  task.lastDoneMeter === null && task.lastDoneOn === null;
const counted = (task: TaskSchedule) =>
  neverRecorded(task) && (task.countFromMeter != null || task.countFromOn != null);

function basisOf(task: TaskSchedule, meter: MeterDue | null): DuePoint['basis'] {
  if (meter?.basis === 'first_service') return 'first_service';
  if (counted(task)) return 'counted';
  const meterRecorded = task.intervalMeter === null || task.lastDoneMeter !== null;
  const calendarRecorded =
    (task.intervalDays === null && !task.seasonAnchor) || task.lastDoneOn !== null;
  const anyRecord = task.lastDoneMeter !== null || task.lastDoneOn !== null;
  return meterRecorded && calendarRecorded && anyRecord ? 'recorded' : 'assumed';
}

/** A task whose last service nobody knows yet: no figure is guessed until someone says. */
const HISTORY_UNKNOWN: DuePoint = {
  status: 'history_unknown',
  governs: null,
  dueMeter: null,
  dueDate: null,
  projectedDate: null,
  projectedLow: null,
  projectedHigh: null,
  effectiveDate: null,
  remainingMeter: null,
  remainingDays: null,
  basis: 'unknown',
};

/**
 * Due point of a task as of a local ISO date. currentValue = lifetime meter now (null → the last
 * reading's value from usage); machineStartIso anchors the calendar of a task never done.
 * Due meter and remainingMeter in meter units, remainingDays in calendar days, dates ISO.
 * A task with historyUnknown, no last service and no start to count from is 'history_unknown',
 * without figures.
 */
export function computeDuePoint(
  task: TaskSchedule,
  usage: UsageEstimate,
  asOfIso: string,
  currentValue: number | null,
  machineStartIso: string | null = null,
  seasonMonths: readonly number[] = [],
): DuePoint {
  if (task.historyUnknown && neverRecorded(task) && !counted(task)) return HISTORY_UNKNOWN;
  const asOfDay = dayNumberFromIso(asOfIso);
  const current = currentValue ?? usage.lastValue;
  const meter = meterDue(task, current);
  const dueMeter = meter?.value ?? null;
  const season = seasonDue(task, seasonMonths, machineStartIso, asOfIso);
  // a season service's date comes from its season alone (the schema keeps a day interval off it)
  const dueDate = season ? season.dueDate : calendarDue(task, machineStartIso);
  const remainingMeter = dueMeter !== null && current !== null ? dueMeter - current : null;
  const remainingDays = dueDate !== null ? daysBetweenIso(asOfIso, dueDate) : null;
  const meterReached = remainingMeter !== null && remainingMeter <= 0;

  const project = (variant: ProjectionVariant) =>
    dueMeter !== null && current !== null && !meterReached
      ? projectDateForValue(usage, dueMeter, asOfDay, variant)
      : null;
  const projectedDate = project('point');
  const projectedLow = project('low');
  const projectedHigh = project('high');
  const outcomes = dueOutcomes(usage, projectedLow, projectedDate, projectedHigh);

  let governs: DuePoint['governs'] = null;
  let effectiveDate: string | null = null;
  if (meterReached) {
    // Due now by the meter; a calendar date that passed earlier is the earlier due date.
    governs = 'meter';
    effectiveDate = dueDate !== null && dueDate < asOfIso ? dueDate : asOfIso;
  } else if (dueDate !== null && (projectedDate === null || dueDate <= projectedDate)) {
    governs = 'calendar';
    effectiveDate = dueDate;
  } else if (projectedDate !== null) {
    governs = 'meter';
    effectiveDate = projectedDate;
  }
  const ahead =
    governs === 'meter' && !meterReached && projectedDate !== null
      ? beforePeak(usage, dueMeter, dayNumberFromIso(projectedDate), asOfDay)
      : null;

  const warnMeter = defaultWarn(task.warnMeter, task.intervalMeter);
  const warnDays = season
    ? (task.warnDays ?? DEFAULT_SEASON_WARN_DAYS)
    : defaultWarn(task.warnDays, task.intervalDays);
  const projectedInDays = projectedDate !== null ? daysBetweenIso(asOfIso, projectedDate) : null;
  let status: DueStatus;
  if (
    (remainingMeter !== null && remainingMeter < 0) ||
    (remainingDays !== null && remainingDays < 0)
  ) {
    status = 'overdue';
  } else if (
    (remainingMeter !== null && remainingMeter <= (warnMeter ?? 0)) ||
    (remainingDays !== null && remainingDays <= (warnDays ?? 0)) ||
    (projectedInDays !== null && warnDays !== null && projectedInDays <= warnDays)
  ) {
    status = 'due_soon';
  } else if (
    dueDate === null &&
    !meterReached &&
    (dueMeter === null || current === null || usage.method === 'none' || notMoving(usage))
  ) {
    // nothing dates it: too few readings, or a meter that is not moving (an idle machine with
    // no past season to say when it works again) — "no forecast", never "ok" without a date;
    // a date more than three years off is "ok" (not in sight), not this
    status = 'no_forecast';
  } else {
    status = 'ok';
  }

  return {
    status,
    governs,
    dueMeter,
    dueDate,
    projectedDate,
    projectedLow,
    projectedHigh,
    effectiveDate,
    remainingMeter,
    remainingDays,
    basis: basisOf(task, meter),
    ...(outcomes && { outcomes }),
    ...(ahead && { beforePeak: ahead }),
    ...(season && { season: season.season }),
  };
}
