// What every reading rule is checked against, read in one statement: which meter of the machine
// is read (the one named, else the primary), its replacements and counter resets, its readings
// either side of a time window, its stored summary and the due fields of the tasks on it; and the
// machine's row lock that serialises the writers of all its meters.
import type { Transaction } from 'sequelize';
import { format } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { directQuery } from '../db-direct';
import type { Machine } from '../models';
import type { MeterReplacementPoint, ReadingPoint } from '../../shared/domain';
import type { MeterKind, MeterUnit } from '../../shared/constants';
import { summaryFromColumns } from './daily-summary';
import { DUE_TASK_COLUMNS, type DueTask } from './forecast-rows';

export interface Neighbour {
  id: string;
  value: number;
  lifetimeValue: number;
  takenAtMs: number;
}

/** A formatter of instants in the organization's time zone, for messages. */
export const timeFormatter = (timeZone: string) => (ms: number) =>
  `${format(new TZDate(ms, timeZone), 'yyyy-MM-dd HH:mm')} (${timeZone})`;

// Existing readings of meter mm.id (of organization $1) from the one before $3 to the one after $4.
const AROUND_SQL = `SELECT id, value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = $1 AND meter_id = mm.id
       AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                 WHERE organization_id = $1 AND meter_id = mm.id AND taken_at < $3), '-infinity')
       AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                 WHERE organization_id = $1 AND meter_id = mm.id AND taken_at > $4), 'infinity')`;

// The implements whose hitch hours a new reading of this meter may change (hitch-readings.ts): on
// this tractor by this meter's kind, still hitched, or unhitched after the reading before the new
// ones (the span's end was read from that reading and the next). Empty for almost every post, so
// the follow-up statements run only for a tractor pulling something.
const HITCHED_SQL = `SELECT coalesce(array_agg(DISTINCT h.implement_id::text), '{}') FROM hitch_spans h
     WHERE h.organization_id = $1 AND h.tractor_id = $2 AND h.meter_kind = mm.kind
       AND (h.ended_at IS NULL OR h.ended_at > coalesce((SELECT max(taken_at) FROM meter_readings
              WHERE organization_id = $1 AND meter_id = mm.id AND taken_at < $3), '-infinity'))`;

interface NeighbourRow {
  id: string;
  value: number | string;
  lifetime_value: number | string;
  taken_at: Date | string;
}

const toNeighbour = (r: NeighbourRow): Neighbour => ({
  id: r.id,
  value: Number(r.value),
  lifetimeValue: Number(r.lifetime_value),
  takenAtMs: new Date(r.taken_at).getTime(),
});

/** The meter a write is on (machine_meters), as the rules need it. */
export interface MeterOfWrite {
  id: string;
  kind: MeterKind;
  unit: MeterUnit;
  isPrimary: boolean;
}

interface ContextRow {
  meter_id: string;
  kind: MeterKind;
  unit: MeterUnit;
  is_primary: boolean;
  replacements: { replacedAt: string; oldFinalValue: number; newStartValue: number }[];
  neighbours: NeighbourRow[];
  tasks: DueTask[];
  hitched: string[];
  has_summary: boolean;
  daily: ReadingPoint[] | null;
  reading_count: number | null;
  last_value: number | null;
  last_raw_value: number | null;
  last_taken_at: Date | null;
  first_taken_at: Date | null;
  first_value: number | null;
}

/**
 * What a batch of new readings of one meter is checked and summarised against, read in one
 * statement after the machine's lock is held (so nothing in it is stale): the meter itself (the
 * one named by `meterId` on this machine, else the primary), its replacements and resets, the
 * existing readings around the batch's times, its stored summary (null if none yet) and the due
 * fields of the tasks bound to it. Null when the machine has no such meter.
 */
export async function writeContext(
  machine: Machine,
  meterId: string | null | undefined,
  fromMs: number,
  toMs: number,
  transaction: Transaction,
) {
  const [row] = await directQuery<ContextRow>(
    transaction,
    // numeric columns as float8, so they arrive as numbers
    `SELECT mm.id AS meter_id, mm.kind, mm.unit, mm.is_primary,
            f.meter_id IS NOT NULL AS has_summary, f.daily, f.reading_count,
            f.last_value::float8 AS last_value, f.last_raw_value::float8 AS last_raw_value,
            f.last_taken_at, f.first_taken_at, f.first_value::float8 AS first_value,
            (SELECT coalesce(json_agg(json_build_object('replacedAt', r.replaced_at,
                      'oldFinalValue', r.old_final_value, 'newStartValue', r.new_start_value)), '[]')
             FROM meter_replacements r
             WHERE r.organization_id = $1 AND r.meter_id = mm.id) AS replacements,
            (SELECT coalesce(json_agg(n ORDER BY n.taken_at, n.lifetime_value), '[]')
             FROM (${AROUND_SQL}) n) AS neighbours,
            (SELECT coalesce(json_agg(t), '[]') FROM (SELECT ${DUE_TASK_COLUMNS} FROM service_tasks
               WHERE organization_id = $1 AND meter_id = mm.id ORDER BY position) t) AS tasks,
            (${HITCHED_SQL}) AS hitched
     FROM machine_meters mm LEFT JOIN machine_forecasts f ON f.meter_id = mm.id
     WHERE mm.organization_id = $1 AND mm.machine_id = $2
       AND CASE WHEN $5::uuid IS NULL THEN mm.is_primary ELSE mm.id = $5::uuid END`,
    [machine.organizationId, machine.id, new Date(fromMs), new Date(toMs), meterId ?? null],
  );
  if (!row) return null;
  const meter: MeterOfWrite = {
    id: row.meter_id,
    kind: row.kind,
    unit: row.unit,
    isPrimary: row.is_primary,
  };
  const replacements: MeterReplacementPoint[] = row.replacements.map((r) => ({
    replacedAtMs: Date.parse(r.replacedAt),
    oldFinalValue: Number(r.oldFinalValue),
    newStartValue: Number(r.newStartValue),
  }));
  const summary = row.has_summary
    ? summaryFromColumns({
        daily: row.daily ?? [],
        readingCount: row.reading_count ?? 0,
        lastValue: row.last_value,
        lastRawValue: row.last_raw_value,
        lastTakenAt: row.last_taken_at && new Date(row.last_taken_at),
        firstTakenAt: row.first_taken_at && new Date(row.first_taken_at),
        firstValue: row.first_value,
      })
    : null;
  return {
    meter,
    replacements,
    neighbours: row.neighbours.map(toNeighbour),
    summary,
    tasks: row.tasks,
    /** implements on this tractor whose hitch readings follow this write */
    hitchedImplementIds: row.hitched,
  };
}

/**
 * Serialises every writer of one machine's readings (new, corrected, deleted) on the machine's row,
 * so two people editing at once cannot each pass the neighbour checks against a stale neighbour.
 */
export async function lockMachineReadings(machineId: string, transaction: Transaction) {
  await directQuery(transaction, 'SELECT id FROM machines WHERE id = $1 FOR UPDATE', [machineId]);
}
