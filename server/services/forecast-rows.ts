// The statements of a forecast refresh: the tasks' due fields read, then one statement writing
// the machine_forecasts rows (summary and usage together), the task_due_points rows and, for a
// reading post, the new readings themselves. Rows go as JSON parameters unpacked by
// jsonb_to_recordset, so a two-year summary (≈30 kB of points) is sent as it is instead of escaped
// into the SQL text value by value, and a post costs one round trip for all its writes.
import { QueryTypes, type InferCreationAttributes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { directQuery } from '../db-direct';
import type { MachineForecast, MeterReading, ServiceTask, TaskDuePoint } from '../models';
import { INSERT_READINGS_SQL, matchStored, type ReadingRow } from './reading-rows';

/** What a task's due point is computed from (due-points-of-meter.ts duePointsFor). */
export type DueTask = Pick<
  ServiceTask,
  | 'id'
  | 'machineId'
  | 'meterId'
  | 'intervalMeter'
  | 'intervalDays'
  | 'firstServiceMeter'
  | 'warnMeter'
  | 'warnDays'
  | 'lastDoneMeter'
  | 'lastDoneOn'
  | 'countFromMeter'
  | 'countFromOn'
  | 'historyUnknown'
  | 'seasonAnchor'
  | 'seasonOffsetDays'
>;

/** The select list of a DueTask row from service_tasks (meter figures as float8: numbers). */
export const DUE_TASK_COLUMNS = `id, machine_id AS "machineId", meter_id AS "meterId", interval_meter::float8 AS "intervalMeter",
  interval_days AS "intervalDays", first_service_meter::float8 AS "firstServiceMeter",
  warn_meter::float8 AS "warnMeter", warn_days AS "warnDays",
  last_done_meter::float8 AS "lastDoneMeter", last_done_on AS "lastDoneOn",
  count_from_meter::float8 AS "countFromMeter", count_from_on AS "countFromOn",
  history_unknown AS "historyUnknown", season_anchor AS "seasonAnchor",
  season_offset_days AS "seasonOffsetDays"`;

/**
 * The due fields of the machines' tasks, as plain rows: every refresh and reading write reads
 * them, and building full model instances cost more than the rest of the due math.
 */
export function dueTasksOf(
  organizationId: string,
  machineIds: string[],
  transaction?: Transaction,
): Promise<DueTask[]> {
  return sequelize.query<DueTask>(
    `SELECT ${DUE_TASK_COLUMNS} FROM service_tasks
     WHERE organization_id = $1 AND machine_id = ANY($2::uuid[])
     ORDER BY meter_id, position`,
    { bind: [organizationId, machineIds], type: QueryTypes.SELECT, transaction },
  );
}

export type ForecastRow = InferCreationAttributes<MachineForecast>;
/** A due point row, with its task's meter (which statement it goes in; not a column). */
export type DueRow = InferCreationAttributes<TaskDuePoint> & { meterId: string };

const SUMMARY_SET = `daily = excluded.daily, reading_count = excluded.reading_count,
  last_value = excluded.last_value, last_raw_value = excluded.last_raw_value,
  last_taken_at = excluded.last_taken_at, first_taken_at = excluded.first_taken_at,
  first_value = excluded.first_value,`;

const upsertForecastsSql = (param: string, summary: boolean) => `INSERT INTO machine_forecasts
    (meter_id, machine_id, organization_id, daily, reading_count, last_value, last_raw_value,
     last_taken_at, first_taken_at, first_value, usage, computed_on, updated_at)
  SELECT r."meterId", r."machineId", r."organizationId", r.daily, r."readingCount", r."lastValue",
    r."lastRawValue", r."lastTakenAt", r."firstTakenAt", r."firstValue", r.usage, r."computedOn",
    r."updatedAt"
  FROM jsonb_to_recordset(${param}::jsonb) AS r("meterId" uuid, "machineId" uuid,
    "organizationId" uuid, daily jsonb, "readingCount" integer, "lastValue" numeric, "lastRawValue" numeric,
    "lastTakenAt" timestamptz, "firstTakenAt" timestamptz, "firstValue" numeric, usage jsonb,
    "computedOn" date, "updatedAt" timestamptz)
  ON CONFLICT (meter_id) DO UPDATE SET ${summary ? SUMMARY_SET : ''}
    usage = excluded.usage, computed_on = excluded.computed_on, updated_at = excluded.updated_at
  RETURNING 1`;

const upsertDuePointsSql = (param: string) => `INSERT INTO task_due_points
    (task_id, organization_id, machine_id, status, sort_date, due, computed_on, updated_at)
  SELECT r."taskId", r."organizationId", r."machineId", r.status, r."sortDate", r.due,
    r."computedOn", r."updatedAt"
  FROM jsonb_to_recordset(${param}::jsonb) AS r("taskId" uuid, "organizationId" uuid,
    "machineId" uuid, status text, "sortDate" date, due jsonb, "computedOn" date,
    "updatedAt" timestamptz)
  ON CONFLICT (task_id) DO UPDATE SET status = excluded.status, sort_date = excluded.sort_date,
    due = excluded.due, computed_on = excluded.computed_on, updated_at = excluded.updated_at
  RETURNING 1`;

// Meters per statement: a fleet-wide refresh stays a few statements of bounded size.
const METERS_PER_STATEMENT = 500;

/**
 * Writes meters' forecast rows and due points, with their new readings when given, in one
 * statement per 500 meters (each part a data-modifying CTE). With `summary` false an existing
 * forecast row keeps its summary columns and takes only the usage: a refresh that does not hold
 * the machine's lock then never writes back a summary a reading write changed meanwhile.
 * Returns the stored readings in the order given.
 */
export async function writeForecasts(
  rows: { forecasts: ForecastRow[]; duePoints: DueRow[]; readings?: ReadingRow[] },
  options: { summary: boolean; transaction?: Transaction },
): Promise<MeterReading[]> {
  const stored: Record<string, unknown>[] = [];
  for (let i = 0; i < rows.forecasts.length; i += METERS_PER_STATEMENT) {
    const forecasts = rows.forecasts.slice(i, i + METERS_PER_STATEMENT);
    const one = rows.forecasts.length <= METERS_PER_STATEMENT;
    const ids = new Set(forecasts.map((f) => f.meterId));
    const duePoints = one ? rows.duePoints : rows.duePoints.filter((d) => ids.has(d.meterId));
    const readings = one
      ? (rows.readings ?? [])
      : (rows.readings ?? []).filter((r) => ids.has(r.meterId));
    const parts = [
      `forecasts AS (${upsertForecastsSql('$1', options.summary)})`,
      `due_points AS (${upsertDuePointsSql('$2')})`,
      ...(readings.length ? [`new_readings AS (${INSERT_READINGS_SQL('$3')})`] : []),
    ];
    const result = await directQuery<Record<string, unknown>>(
      options.transaction,
      `WITH ${parts.join(',\n')}
       ${readings.length ? 'SELECT * FROM new_readings' : 'SELECT 1 AS done'}`,
      [
        JSON.stringify(forecasts),
        JSON.stringify(duePoints),
        ...(readings.length ? [JSON.stringify(readings)] : []),
      ],
    );
    if (readings.length) stored.push(...result);
  }
  return rows.readings?.length ? matchStored(rows.readings, stored) : [];
}
