// When each demo task was last done. A machine's service history is simulated over its generated
// readings (each task done when its meter or calendar interval came round, a little early at
// times), then a few tasks are set one interval behind (overdue) and the number of due-soon tasks
// is brought into a small range. Statuses are judged with the same shared/domain functions and the
// same daily summary the forecast service uses, so the due list shows on "today" what is planned here.
import {
  computeDuePoint,
  dayNumberFromIso,
  estimateUsage,
  isoFromDayNumber,
  lifetimeValueAt,
  localDayNumber,
  todayIso,
  type DueStatus,
  type ReadingPoint,
  type TaskSchedule,
  type UsageEstimate,
} from '../../shared/domain';
import { seasonSpans } from '../../shared/domain/season-dates';
import type { TaskInput } from '../../shared/schemas/schedule';
import { summariseReadings } from '../services/forecast';
import { createRandom, seedFromString } from './random';

export interface LastDone {
  /** lifetime meter value at the last service, meter units */
  lastDoneMeter: number;
  /** local ISO date of the last service */
  lastDoneOn: string;
}

/** What the planner knows about one machine: its readings (lifetime values) and its tasks. */
export interface MachinePlanInput {
  fleetNumber: string;
  readings: { lifetimeValue: number; takenAt: Date }[];
  tasks: TaskInput[];
  /** months (1–12) the machine works; [] all year. Dates its season services. */
  seasonMonths?: number[];
}

export interface PlannedTask {
  fleetNumber: string;
  task: TaskInput;
  position: number;
  lastDone: LastDone;
  status: DueStatus;
}

export interface PlanOptions {
  timeZone: string;
  today: Date;
  overdue: [string, string][];
  dueSoonFirst: [string, string][];
  dueSoonRange: { min: number; max: number };
}

interface MachineCurve {
  seasonMonths: number[];
  points: ReadingPoint[];
  usage: UsageEstimate;
  current: number;
  startIso: string;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** Local day (integer) at which the lifetime curve first reached value; extrapolated before the first reading. */
function dayAtValue(points: ReadingPoint[], value: number): number {
  const first = points[0];
  const last = points[points.length - 1];
  if (value <= first.value) {
    const rate = (last.value - first.value) / Math.max(1, last.day - first.day);
    return Math.floor(first.day - (rate > 0 ? (first.value - value) / rate : 0));
  }
  const i = points.findIndex((p) => p.value >= value);
  if (i < 0) return Math.floor(last.day);
  const a = points[i - 1];
  const b = points[i];
  return Math.floor(a.day + ((b.day - a.day) * (value - a.value)) / (b.value - a.value));
}

function pointAtDay(curve: MachineCurve, day: number): LastDone {
  return {
    lastDoneMeter: round1(lifetimeValueAt(curve.points, day)),
    lastDoneOn: isoFromDayNumber(day),
  };
}

function pointAtValue(curve: MachineCurve, value: number): LastDone {
  const v = round1(Math.max(0, value));
  return { lastDoneMeter: v, lastDoneOn: isoFromDayNumber(dayAtValue(curve.points, v)) };
}

/** Service history of one task over the readings: done whenever an interval came round. */
function simulate(task: TaskInput, curve: MachineCurve, seed: number): LastDone[] {
  const rng = createRandom(seed);
  const { intervalMeter: im } = task;
  // A season service comes round once a season: simulated as yearly; its due date is the season's.
  const id = task.intervalDays ?? (task.seasonAnchor ? 365 : null);
  const first = curve.points[0];
  // A phase before the history starts, as if the schedule had been running already.
  let meter = first.value - (im ? rng.between(0, im) : 0);
  let day = Math.floor(first.day - (id ? rng.between(0, id) : rng.between(0, 200)));
  const done: LastDone[] = [
    { lastDoneMeter: round1(Math.max(0, meter)), lastDoneOn: isoFromDayNumber(day) },
  ];
  let early = rng.between(0.9, 1);
  for (const p of curve.points) {
    const byMeter = im !== null && p.value >= meter + im * early;
    const byDays = id !== null && p.day >= day + id * early;
    if (!byMeter && !byDays) continue;
    meter = p.value;
    day = Math.floor(p.day);
    done.push({ lastDoneMeter: round1(meter), lastDoneOn: isoFromDayNumber(day) });
    early = rng.between(0.9, 1);
  }
  return done;
}

function statusOf(
  task: TaskInput,
  lastDone: LastDone,
  curve: MachineCurve,
  asOfIso: string,
): DueStatus {
  const schedule: TaskSchedule = {
    intervalMeter: task.intervalMeter,
    intervalDays: task.intervalDays,
    firstServiceMeter: task.firstServiceMeter,
    warnMeter: task.warnMeter,
    warnDays: task.warnDays,
    seasonAnchor: task.seasonAnchor ?? null,
    seasonOffsetDays: task.seasonOffsetDays ?? null,
    ...lastDone,
  };
  return computeDuePoint(
    schedule,
    curve.usage,
    asOfIso,
    curve.current,
    curve.startIso,
    curve.seasonMonths,
  ).status;
}

/**
 * A last-done point that leaves the task a little overdue: by about 7% of its meter interval or
 * 12 days past its calendar one, whichever limit runs out first (the later of the two points), so
 * a task with both is not shown a year over.
 */
function overduePoint(task: TaskInput, curve: MachineCurve, todayDay: number): LastDone {
  const byMeter =
    task.intervalMeter !== null
      ? pointAtValue(curve, curve.current - task.intervalMeter * 1.07)
      : null;
  const byDays =
    task.intervalDays !== null ? pointAtDay(curve, todayDay - task.intervalDays - 12) : null;
  if (byMeter && byDays) return byMeter.lastDoneOn > byDays.lastDoneOn ? byMeter : byDays;
  return byMeter ?? byDays ?? pointAtDay(curve, todayDay - 377);
}

/**
 * A season service done on time at its last season date that has come (the storage service after
 * this year's season, the pre-season check before it), so the demo starts with it covered.
 */
function seasonPoint(task: TaskInput, curve: MachineCurve, todayDay: number): LastDone | null {
  if (!task.seasonAnchor || !curve.seasonMonths.length) return null;
  const offset = task.seasonOffsetDays ?? 0;
  const year = Number(isoFromDayNumber(todayDay).slice(0, 4));
  const onTime = seasonSpans(curve.seasonMonths, year - 2, year)
    .map((span) =>
      task.seasonAnchor === 'before_start'
        ? dayNumberFromIso(span.start) - offset
        : dayNumberFromIso(span.end) + offset,
    )
    .filter((day) => day <= todayDay && day >= curve.points[0].day);
  return onTime.length ? pointAtDay(curve, Math.max(...onTime)) : null;
}

/** A last-done point inside the task's warning window (half of it left). */
function dueSoonPoint(task: TaskInput, curve: MachineCurve, todayDay: number): LastDone {
  if (task.intervalMeter !== null) {
    const warn = task.warnMeter ?? task.intervalMeter / 10;
    return pointAtValue(curve, curve.current - task.intervalMeter + warn / 2);
  }
  const days = task.intervalDays ?? 0;
  return pointAtDay(curve, todayDay - days + Math.ceil((task.warnDays ?? days / 10) / 2));
}

/** Last-done points of every task of a farm's machines, so "today" shows a few overdue, a few due soon, most fine. */
export function planLastDone(machines: MachinePlanInput[], options: PlanOptions): PlannedTask[] {
  const { timeZone, today } = options;
  const asOfIso = todayIso(timeZone, today);
  const todayDay = dayNumberFromIso(asOfIso);
  const curves = new Map<string, MachineCurve>();
  const planned: PlannedTask[] = [];

  for (const m of machines) {
    const points = summariseReadings(m.readings, timeZone);
    const curve: MachineCurve = {
      seasonMonths: m.seasonMonths ?? [],
      points,
      usage: estimateUsage(points, localDayNumber(today, timeZone)),
      current: points[points.length - 1].value,
      startIso: isoFromDayNumber(localDayNumber(m.readings[0].takenAt, timeZone)),
    };
    curves.set(m.fleetNumber, curve);
    m.tasks.forEach((task, position) => {
      const history = simulate(task, curve, seedFromString(`${m.fleetNumber}/${task.name}`));
      const lastDone =
        seasonPoint(task, curve, dayNumberFromIso(asOfIso)) ?? history[history.length - 1];
      planned.push({
        fleetNumber: m.fleetNumber,
        task,
        position,
        lastDone,
        status: statusOf(task, lastDone, curve, asOfIso),
      });
    });
  }

  const find = ([fleet, name]: [string, string]) =>
    planned.find((p) => p.fleetNumber === fleet && p.task.name === name);
  const set = (p: PlannedTask, lastDone: LastDone): DueStatus => {
    const curve = curves.get(p.fleetNumber)!;
    p.lastDone = lastDone;
    p.status = statusOf(p.task, lastDone, curve, asOfIso);
    return p.status;
  };
  const chosen = new Set<PlannedTask>();

  for (const pick of options.overdue) {
    const p = find(pick);
    if (!p) continue;
    set(p, overduePoint(p.task, curves.get(p.fleetNumber)!, todayDay));
    chosen.add(p);
  }

  // Too many due soon (a busy season): the extra ones were done at the latest reading.
  const preferred = options.dueSoonFirst.map(find).filter((p): p is PlannedTask => p !== undefined);
  const dueSoon = () => planned.filter((p) => p.status === 'due_soon' && !chosen.has(p));
  const keepOrder = (p: PlannedTask) => (preferred.includes(p) ? 0 : 1);
  const surplus = dueSoon()
    .sort((a, b) => keepOrder(a) - keepOrder(b))
    .slice(options.dueSoonRange.max);
  for (const p of surplus) {
    const curve = curves.get(p.fleetNumber)!;
    set(p, pointAtDay(curve, curve.points[curve.points.length - 1].day));
  }

  // Too few: put preferred tasks (then any fine ones) inside their warning window.
  const candidates = [...preferred, ...planned.filter((p) => !preferred.includes(p))];
  for (const p of candidates) {
    if (dueSoon().length >= options.dueSoonRange.min) break;
    if (p.status !== 'ok' || chosen.has(p)) continue;
    const before = p.lastDone;
    if (set(p, dueSoonPoint(p.task, curves.get(p.fleetNumber)!, todayDay)) !== 'due_soon')
      set(p, before);
  }
  return planned;
}
