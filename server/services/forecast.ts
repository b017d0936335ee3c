import { Op, QueryTypes, type InferCreationAttributes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { Machine, MachineForecast, MachineMeter, Organization, type MeterReading } from '../models';
import { plannedUseOn, todayIso } from '../../shared/domain';
import { dueTasksOf, writeForecasts, type DueRow, type DueTask } from './forecast-rows';
import type { ReadingRow } from './reading-rows';
import {
  emptySummary,
  pickSummaryColumns,
  summaryColumns,
  summaryOf,
  type ReadingSummary,
  type SummaryColumns,
  type SummaryReading,
} from './daily-summary';

import { duePointsFor, storedUsage } from './due-points-of-meter';

export { summariseReadings } from './daily-summary';

/**
 * Rebuilds the forecast summary of each of a machine's meters from all its readings, then its
 * tasks' due points (one write of each). Reading writes keep the summaries current incrementally
 * (reading-summary.ts); this full pass is for a new machine, a time-zone change and the rare case
 * those cannot settle.
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
  // every meter of the machine, a meter without readings as one row of nulls
  const readings = await sequelize.query<{
    meter_id: string;
    value: number | null;
    lifetime_value: number | null;
    taken_at: Date | null;
  }>(
    `SELECT mm.id AS meter_id, r.value, r.lifetime_value, r.taken_at FROM machine_meters mm
     LEFT JOIN meter_readings r ON r.organization_id = mm.organization_id AND r.meter_id = mm.id
     WHERE mm.organization_id = :organizationId AND mm.machine_id = :machineId
     ORDER BY mm.id, r.taken_at, r.lifetime_value`,
    { replacements: { organizationId, machineId }, type: QueryTypes.SELECT, transaction },
  );
  const byMeter = new Map<string, SummaryReading[]>();
  for (const r of readings) {
    const list = byMeter.get(r.meter_id) ?? [];
    byMeter.set(r.meter_id, list);
    if (r.taken_at === null) continue;
    list.push({
      value: Number(r.value),
      lifetimeValue: Number(r.lifetime_value),
      takenAt: new Date(r.taken_at),
    });
  }
  const summaries = new Map([...byMeter].map(([id, list]) => [id, summaryOf(list, timeZone)]));
  const meters = [...byMeter.keys()].map((id) => ({ id, machineId }));
  await storeForecasts(organizationId, summaries, { transaction, timeZone, meters });
}

/** A meter as a forecast needs it: which machine it is on. */
export interface MeterOfMachine {
  id: string;
  machineId: string;
}

interface StoreOptions {
  transaction?: Transaction;
  timeZone?: string;
  now?: Date;
  /** the machines already loaded (their season months), to spare reading them again */
  machines?: (Pick<Machine, 'id' | 'seasonMonths'> & Partial<Pick<Machine, 'seasonPlans'>>)[];
  /** the meters of the summaries given, to spare reading them again */
  meters?: MeterOfMachine[];
  /** their tasks' due fields by meter, already read (reading-neighbours.ts writeContext) */
  tasks?: Map<string, DueTask[]>;
}

/**
 * Recomputes and stores the usage estimate and task due points of every meter of the given
 * machines (all of the organization's when machineIds is omitted) from their stored summaries.
 */
export async function recomputeDuePoints(
  organizationId: string,
  machineIds?: string[],
  options: StoreOptions = {},
): Promise<void> {
  await computeAndStore(organizationId, machineIds, null, options);
}

/**
 * Stores new summaries of meters (keyed by meter id) with their usage estimates and due points —
 * and the new readings they summarise, when given — in one statement (forecast-rows.ts
 * writeForecasts). Returns the stored readings.
 */
export async function storeForecasts(
  organizationId: string,
  summaries: Map<string, ReadingSummary>,
  options: StoreOptions & { readings?: ReadingRow[] } = {},
): Promise<MeterReading[]> {
  if (!summaries.size) return [];
  const meters =
    options.meters ??
    (await MachineMeter.findAll({
      where: { organizationId, id: { [Op.in]: [...summaries.keys()] } },
      attributes: ['id', 'machineId'],
      transaction: options.transaction,
    }));
  const machineIds = [...new Set(meters.map((m) => m.machineId))];
  return computeAndStore(organizationId, machineIds, summaries, { ...options, meters });
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
      attributes: ['id', 'seasonMonths', 'seasonPlans'],
      transaction,
    }));
  if (!machines.length) return [];
  const ids = machines.map((m) => m.id);
  const seasonOf = new Map(machines.map((m) => [m.id, m.seasonMonths]));
  const plansOf = new Map(machines.map((m) => [m.id, m.seasonPlans ?? {}]));
  const [meters, forecasts, tasks] = await Promise.all([
    options.meters ??
      MachineMeter.findAll({
        where: { organizationId, machineId: { [Op.in]: ids } },
        attributes: ['id', 'machineId'],
        transaction,
      }),
    summaries
      ? []
      : MachineForecast.findAll({
          where: { organizationId, machineId: { [Op.in]: ids } },
          transaction,
        }),
    options.tasks ? [] : dueTasksOf(organizationId, ids, transaction),
  ]);
  const summaryOfMeter = new Map<string, SummaryColumns>(
    summaries
      ? [...summaries].map(([id, s]) => [id, summaryColumns(s)])
      : forecasts.map((f) => [f.meterId, pickSummaryColumns(f)]),
  );
  const tasksOf = options.tasks ?? new Map<string, DueTask[]>();
  for (const t of tasks) tasksOf.set(t.meterId, [...(tasksOf.get(t.meterId) ?? []), t]);

  const dueRows: DueRow[] = [];
  const forecastRows: InferCreationAttributes<MachineForecast>[] = [];
  for (const { id, machineId } of meters) {
    const summary = summaryOfMeter.get(id) ?? null;
    const { usage, points } = duePointsFor(
      summary,
      tasksOf.get(id) ?? [],
      timeZone,
      asOfIso,
      now,
      seasonOf.get(machineId) ?? [],
      plannedUseOn(plansOf.get(machineId), id, asOfIso, seasonOf.get(machineId) ?? []),
    );
    forecastRows.push({
      ...(summary ?? summaryColumns(emptySummary())),
      meterId: id,
      machineId,
      organizationId,
      usage: storedUsage(usage),
      computedOn: asOfIso,
      updatedAt: now,
    });
    for (const [taskId, due] of points) {
      dueRows.push({
        taskId,
        meterId: id,
        organizationId,
        machineId,
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
    `SELECT DISTINCT m.machine_id AS id FROM machine_meters m LEFT JOIN machine_forecasts f ON f.meter_id = m.id
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
