import { Op, QueryTypes, type InferCreationAttributes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { Machine, MachineForecast, Organization, ServiceTask, TaskDuePoint } from '../models';
import {
  computeDuePoint,
  estimateUsage,
  isoFromDayNumber,
  localDayNumber,
  todayIso,
  type DuePoint,
  type ReadingPoint,
  type UsageEstimate,
} from '../../shared/domain';

/** Days of daily summary kept per machine: a season (365 d) plus comparison weeks and slack. */
const SUMMARY_DAYS = 3 * 365;

/** Builds the per-day summary (each local day's last lifetime value) from a machine's readings. */
export function summariseReadings(
  readings: { lifetimeValue: number; takenAt: Date }[],
  timeZone: string,
): ReadingPoint[] {
  const byDay = new Map<number, ReadingPoint>();
  for (const r of readings) {
    const day = localDayNumber(r.takenAt, timeZone);
    const key = Math.floor(day);
    const prev = byDay.get(key);
    if (!prev || day >= prev.day) byDay.set(key, { day, value: r.lifetimeValue });
  }
  const points = [...byDay.values()].sort((a, b) => a.day - b.day);
  const cutoff = (points.at(-1)?.day ?? 0) - SUMMARY_DAYS;
  return points.filter((p) => p.day >= cutoff);
}

/**
 * Rewrites a machine's forecast summary from its readings, then its tasks' due points. Called in the
 * transaction of every reading change, so the due list never rescans readings.
 */
export async function refreshMachineForecast(
  machineId: string,
  organizationId: string,
  transaction?: Transaction,
): Promise<void> {
  const org = await Organization.findByPk(organizationId, { transaction });
  if (!org) return;
  const readings = await sequelize.query<{ value: number; lifetime_value: number; taken_at: Date }>(
    `SELECT value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :organizationId AND machine_id = :machineId ORDER BY taken_at, lifetime_value`,
    { replacements: { organizationId, machineId }, type: QueryTypes.SELECT, transaction },
  );
  const daily = summariseReadings(
    readings.map((r) => ({
      lifetimeValue: Number(r.lifetime_value),
      takenAt: new Date(r.taken_at),
    })),
    org.timeZone,
  );
  const last = readings.at(-1);
  await MachineForecast.upsert(
    {
      machineId,
      organizationId,
      daily,
      readingCount: readings.length,
      lastValue: last ? Number(last.lifetime_value) : null,
      lastRawValue: last ? Number(last.value) : null,
      lastTakenAt: last ? new Date(last.taken_at) : null,
      firstTakenAt: readings[0] ? new Date(readings[0].taken_at) : null,
      firstValue: readings[0] ? Number(readings[0].lifetime_value) : null,
      usage: null,
      computedOn: null,
    },
    { transaction },
  );
  await recomputeDuePoints(organizationId, [machineId], { transaction, timeZone: org.timeZone });
}

/**
 * The due point of each task of one machine, from its summary, as of a local date; the machine's
 * season months (1–12, [] = all year) date its season services.
 */
export function duePointsFor(
  forecast: Pick<MachineForecast, 'daily' | 'lastValue' | 'firstTakenAt' | 'firstValue'> | null,
  tasks: ServiceTask[],
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

/**
 * Recomputes and stores the usage estimate and task due points of the given machines (all of the
 * organization's when machineIds is omitted) from their stored summaries.
 */
export async function recomputeDuePoints(
  organizationId: string,
  machineIds?: string[],
  options: { transaction?: Transaction; timeZone?: string; now?: Date } = {},
): Promise<void> {
  const { transaction } = options;
  const now = options.now ?? new Date();
  const timeZone =
    options.timeZone ??
    (await Organization.findByPk(organizationId, { transaction }))?.timeZone ??
    'UTC';
  const asOfIso = todayIso(timeZone, now);
  const machineWhere = { organizationId, ...(machineIds && { id: { [Op.in]: machineIds } }) };
  const machines = await Machine.findAll({
    where: machineWhere,
    attributes: ['id', 'seasonMonths'],
    transaction,
  });
  if (!machines.length) return;
  const ids = machines.map((m) => m.id);
  const seasonOf = new Map(machines.map((m) => [m.id, m.seasonMonths]));
  const [forecasts, tasks] = await Promise.all([
    MachineForecast.findAll({
      where: { organizationId, machineId: { [Op.in]: ids } },
      transaction,
    }),
    ServiceTask.findAll({ where: { organizationId, machineId: { [Op.in]: ids } }, transaction }),
  ]);
  const forecastOf = new Map(forecasts.map((f) => [f.machineId, f]));
  const tasksOf = new Map<string, ServiceTask[]>();
  for (const t of tasks) tasksOf.set(t.machineId, [...(tasksOf.get(t.machineId) ?? []), t]);

  const dueRows: InferCreationAttributes<TaskDuePoint>[] = [];
  const usageRows: InferCreationAttributes<MachineForecast>[] = [];
  for (const id of ids) {
    const forecast = forecastOf.get(id) ?? null;
    const { usage, points } = duePointsFor(
      forecast,
      tasksOf.get(id) ?? [],
      timeZone,
      asOfIso,
      now,
      seasonOf.get(id) ?? [],
    );
    usageRows.push({
      machineId: id,
      organizationId,
      daily: forecast?.daily ?? [],
      readingCount: forecast?.readingCount ?? 0,
      lastValue: forecast?.lastValue ?? null,
      lastRawValue: forecast?.lastRawValue ?? null,
      lastTakenAt: forecast?.lastTakenAt ?? null,
      firstTakenAt: forecast?.firstTakenAt ?? null,
      firstValue: forecast?.firstValue ?? null,
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
  await MachineForecast.bulkCreate(usageRows, {
    updateOnDuplicate: ['usage', 'computedOn', 'updatedAt'],
    transaction,
  });
  if (dueRows.length) {
    await TaskDuePoint.bulkCreate(dueRows, {
      updateOnDuplicate: ['status', 'sortDate', 'due', 'computedOn', 'updatedAt'],
      transaction,
    });
  }
}

/** Rebuilds every machine's summary and due points in an organization (demo load, nightly job). */
export async function refreshOrganizationForecasts(organizationId: string): Promise<void> {
  const machines = await Machine.findAll({ where: { organizationId }, attributes: ['id'] });
  for (const m of machines) await refreshMachineForecast(m.id, organizationId);
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
