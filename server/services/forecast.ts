import { Op, QueryTypes, type InferCreationAttributes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { Machine, MachineForecast, Organization, type MeterReading, TaskDuePoint } from '../models';
import {
  computeDuePoint,
  estimateUsage,
  isoFromDayNumber,
  localDayNumber,
  todayIso,
  type DuePoint,
  type UsageEstimate,
} from '../../shared/domain';
import { dueTasksOf, writeForecasts, type DueTask } from './forecast-rows';
import type { ReadingRow } from './reading-rows';
import {
  emptySummary,
  pickSummaryColumns,
  summaryColumns,
  summaryOf,
  type ReadingSummary,
  type SummaryColumns,
} from './daily-summary';

export { summariseReadings } from './daily-summary';

/**
 * Rebuilds a machine's forecast summary from all its readings, then its tasks' due points (one
 * write of each). Reading writes keep the summary current incrementally (reading-summary.ts);
 * this full pass is for a new machine, a time-zone change and the rare case those cannot settle.
 */
export async function refreshMachineForecast(
  machineId: string,
  organizationId: string,
  transaction?: Transaction,
  options: { timeZone?: string } = {},
): Promise<void> {
  const timeZone =
    options.timeZone ??
    (await Organization.findByPk(organizationId, { transaction, attributes: ['timeZone'] }))
      ?.timeZone;
  if (!timeZone) return;
  const readings = await sequelize.query<{ value: number; lifetime_value: number; taken_at: Date }>(
    `SELECT value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :organizationId AND machine_id = :machineId ORDER BY taken_at, lifetime_value`,
    { replacements: { organizationId, machineId }, type: QueryTypes.SELECT, transaction },
  );
  const summary = summaryOf(
    readings.map((r) => ({
      value: Number(r.value),
      lifetimeValue: Number(r.lifetime_value),
      takenAt: new Date(r.taken_at),
    })),
    timeZone,
  );
  await storeForecasts(organizationId, new Map([[machineId, summary]]), { transaction, timeZone });
}

/**
 * The due point of each task of one machine, from its summary, as of a local date; the machine's
 * season months (1–12, [] = all year) date its season services.
 */
export function duePointsFor(
  forecast: Pick<MachineForecast, 'daily' | 'lastValue' | 'firstTakenAt' | 'firstValue'> | null,
  tasks: DueTask[],
  timeZone: string,
  asOfIso: string,
  now: Date,
  seasonMonths: readonly number[] = [],
): { usage: UsageEstimate; points: Map<string, DuePoint> } {
  const daily = forecast?.daily ?? [];
  const usage = estimateUsage(daily, localDayNumber(now, timeZone));
  const startIso = forecast?.firstTakenAt
    ? isoFromDayNumber(localDayNumber(forecast.firstTakenAt, timeZone))
    : null;
  // A machine whose first reading was above zero came with hours: a task added to it without a
  // last service has an unknown history, not the "serviced on time since new" assumption.
  const cameWithHours = (forecast?.firstValue ?? 0) > 0;
  const points = new Map<string, DuePoint>();
  for (const task of tasks) {
    points.set(
      task.id,
      computeDuePoint(
        {
          intervalMeter: task.intervalMeter,
          intervalDays: task.intervalDays,
          firstServiceMeter: task.firstServiceMeter,
          warnMeter: task.warnMeter,
          warnDays: task.warnDays,
          lastDoneMeter: task.lastDoneMeter,
          lastDoneOn: task.lastDoneOn,
          countFromMeter: task.countFromMeter,
          countFromOn: task.countFromOn,
          historyUnknown: task.historyUnknown && cameWithHours,
          seasonAnchor: task.seasonAnchor ?? null,
          seasonOffsetDays: task.seasonOffsetDays ?? null,
        },
        usage,
        asOfIso,
        forecast?.lastValue ?? null,
        startIso,
        seasonMonths,
      ),
    );
  }
  return { usage, points };
}

interface StoreOptions {
  transaction?: Transaction;
  timeZone?: string;
  now?: Date;
  /** the machines already loaded (their season months), to spare reading them again */
  machines?: Pick<Machine, 'id' | 'seasonMonths'>[];
  /** their tasks' due fields, already read (reading-neighbours.ts writeContext) */
  tasks?: Map<string, DueTask[]>;
}

/**
 * Recomputes and stores the usage estimate and task due points of the given machines (all of the
 * organization's when machineIds is omitted) from their stored summaries.
 */
export async function recomputeDuePoints(
  organizationId: string,
  machineIds?: string[],
  options: StoreOptions = {},
): Promise<void> {
  await computeAndStore(organizationId, machineIds, null, options);
}

/**
 * Stores new summaries of machines with their usage estimates and due points — and the new
 * readings they summarise, when given — in one statement (forecast-rows.ts writeForecasts).
 * Returns the stored readings.
 */
export async function storeForecasts(
  organizationId: string,
  summaries: Map<string, ReadingSummary>,
  options: StoreOptions & { readings?: ReadingRow[] } = {},
): Promise<MeterReading[]> {
  if (!summaries.size) return [];
  return computeAndStore(organizationId, [...summaries.keys()], summaries, options);
}

async function computeAndStore(
  organizationId: string,
  machineIds: string[] | undefined,
  summaries: Map<string, ReadingSummary> | null,
  options: StoreOptions & { readings?: ReadingRow[] },
): Promise<MeterReading[]> {
  const { transaction } = options;
  const now = options.now ?? new Date();
  const timeZone =
    options.timeZone ??
    (await Organization.findByPk(organizationId, { transaction }))?.timeZone ??
    'UTC';
  const asOfIso = todayIso(timeZone, now);
  const machineWhere = { organizationId, ...(machineIds && { id: { [Op.in]: machineIds } }) };
  const machines =
    options.machines ??
    (await Machine.findAll({
      where: machineWhere,
      attributes: ['id', 'seasonMonths'],
      transaction,
    }));
  if (!machines.length) return [];
  const ids = machines.map((m) => m.id);
  const seasonOf = new Map(machines.map((m) => [m.id, m.seasonMonths]));
  const [forecasts, tasks] = await Promise.all([
    summaries
      ? []
      : MachineForecast.findAll({
          where: { organizationId, machineId: { [Op.in]: ids } },
          transaction,
        }),
    options.tasks ? [] : dueTasksOf(organizationId, ids, transaction),
  ]);
  const summaryOfMachine = new Map<string, SummaryColumns>(
    summaries
      ? [...summaries].map(([id, s]) => [id, summaryColumns(s)])
      : forecasts.map((f) => [f.machineId, pickSummaryColumns(f)]),
  );
  const tasksOf = options.tasks ?? new Map<string, DueTask[]>();
  for (const t of tasks) tasksOf.set(t.machineId, [...(tasksOf.get(t.machineId) ?? []), t]);

  const dueRows: InferCreationAttributes<TaskDuePoint>[] = [];
  const forecastRows: InferCreationAttributes<MachineForecast>[] = [];
  for (const id of ids) {
    const summary = summaryOfMachine.get(id) ?? null;
    const { usage, points } = duePointsFor(
      summary,
      tasksOf.get(id) ?? [],
      timeZone,
      asOfIso,
      now,
      seasonOf.get(id) ?? [],
    );
    forecastRows.push({
      ...(summary ?? summaryColumns(emptySummary())),
      machineId: id,
      organizationId,
      usage,
      computedOn: asOfIso,
      updatedAt: now,
    });
    for (const [taskId, due] of points) {
      dueRows.push({
        taskId,
        organizationId,
        machineId: id,
        status: due.status,
        sortDate: due.effectiveDate,
        due,
        computedOn: asOfIso,
        updatedAt: now,
      });
    }
  }
  return writeForecasts(
    { forecasts: forecastRows, duePoints: dueRows, readings: options.readings },
    { summary: summaries !== null, transaction },
  );
}

/**
 * Rebuilds every machine's summary and due points in an organization (demo load; a time-zone
 * change, since the summary's days are local days of the organization's zone).
 */
export async function refreshOrganizationForecasts(
  organizationId: string,
  options: { transaction?: Transaction; timeZone?: string } = {},
): Promise<void> {
  const { transaction } = options;
  const machines = await Machine.findAll({
    where: { organizationId },
    attributes: ['id'],
    transaction,
  });
  for (const m of machines)
    await refreshMachineForecast(m.id, organizationId, transaction, options);
}

/** Brings stale due points (computed before today in the org's time zone) up to date. */
export async function ensureDuePointsCurrent(
  organizationId: string,
  timeZone: string,
  now = new Date(),
) {
  const asOfIso = todayIso(timeZone, now);
  const stale = await sequelize.query<{ id: string }>(
    `SELECT m.id FROM machines m LEFT JOIN machine_forecasts f ON f.machine_id = m.id
     WHERE m.organization_id = :organizationId AND (f.computed_on IS NULL OR f.computed_on <> :asOfIso)`,
    { replacements: { organizationId, asOfIso }, type: QueryTypes.SELECT },
  );
  if (stale.length) {
    await recomputeDuePoints(
      organizationId,
      stale.map((s) => s.id),
      { timeZone, now },
    );
  }
}
