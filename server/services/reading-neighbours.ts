// What every reading rule is checked against, read in one statement for every meter of a batch
// (one reading post, or a telematics snapshot of a whole fleet): which meter of the machine is read (the one named, else the primary), its replacements and counter resets, its readings
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

// Existing readings of meter mm.id (of organization $1) from the one before q.from_at to the one
// after q.to_at (q: the row of the request, writeContexts).
const AROUND_SQL = `SELECT id, value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = $1 AND meter_id = mm.id
       AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                 WHERE organization_id = $1 AND meter_id = mm.id AND taken_at < q.from_at), '-infinity')
       AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                 WHERE organization_id = $1 AND meter_id = mm.id AND taken_at > q.to_at), 'infinity')`;

// The implements whose hitch hours a new reading of this meter may change (hitch-readings.ts): on
// this tractor by this meter's kind, still hitched, or unhitched after the reading before the new
// ones (the span's end was read from that reading and the next). Empty for almost every post, so
// the follow-up statements run only for a tractor pulling something.
const HITCHED_SQL = `SELECT coalesce(array_agg(DISTINCT h.implement_id::text), '{}') FROM hitch_spans h
     WHERE h.organization_id = $1 AND h.tractor_id = q.machine_id AND h.meter_kind = mm.kind
       AND (h.ended_at IS NULL OR h.ended_at > coalesce((SELECT max(taken_at) FROM meter_readings
              WHERE organization_id = $1 AND meter_id = mm.id AND taken_at < q.from_at), '-infinity'))`;

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
  place: string;
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

/** One meter's batch of new readings: which meter (null: the primary) and their time span. */
export interface ContextRequest {
  machine: Machine;
  meterId: string | null | undefined;
  fromMs: number;
  toMs: number;
}

/** What writeContexts reads for one meter. */
export type WriteContext = NonNullable<Awaited<ReturnType<typeof writeContexts>>[number]>;

/**
 * What batches of new readings of meters are checked and summarised against, read in one
 * statement for all of them after their machines' locks are held (so nothing in it is stale):
 * for each request (machines of one organization), the meter itself (the one named by `meterId`
 * on the machine, else the primary), its replacements and resets, the existing readings around
 * the batch's times, its stored summary (null if none yet), the due fields of the tasks bound to
 * it and the implements it pulls. Null in a request's place when the machine has no such meter.
 */
export async function writeContexts(requests: ContextRequest[], transaction: Transaction) {
  if (!requests.length) return [];
  const rows = await directQuery<ContextRow>(
    transaction,
    // numeric columns as float8, so they arrive as numbers
    `SELECT q.place, mm.id AS meter_id, mm.kind, mm.unit, mm.is_primary,
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
     FROM unnest($2::uuid[], $3::uuid[], $4::timestamptz[], $5::timestamptz[])
            WITH ORDINALITY AS q(machine_id, meter_id, from_at, to_at, place)
     JOIN machine_meters mm ON mm.organization_id = $1 AND mm.machine_id = q.machine_id
       AND CASE WHEN q.meter_id IS NULL THEN mm.is_primary ELSE mm.id = q.meter_id END
     LEFT JOIN machine_forecasts f ON f.meter_id = mm.id`,
    [
      requests[0].machine.organizationId,
      requests.map((r) => r.machine.id),
      requests.map((r) => r.meterId ?? null),
      requests.map((r) => new Date(r.fromMs)),
      requests.map((r) => new Date(r.toMs)),
    ],
  );
  const byPlace = new Map(rows.map((row) => [Number(row.place) - 1, row]));
  return requests.map((_, i) => {
    const row = byPlace.get(i);
    return row ? contextOf(row) : null;
  });
}

/** writeContexts for one meter's batch: null when the machine has no such meter. */
export async function writeContext(
  machine: Machine,
  meterId: string | null | undefined,
  fromMs: number,
  toMs: number,
  transaction: Transaction,
) {
  const [context] = await writeContexts([{ machine, meterId, fromMs, toMs }], transaction);
  return context;
}

function contextOf(row: ContextRow) {
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

/** lockMachineReadings for several machines in one statement, in id order (no deadlock). */
export async function lockMachinesReadings(machineIds: string[], transaction: Transaction) {
  if (machineIds.length === 1) return lockMachineReadings(machineIds[0], transaction);
  if (machineIds.length)
    await directQuery(
      transaction,
      'SELECT id FROM machines WHERE id = ANY($1::uuid[]) ORDER BY id FOR UPDATE',
      [machineIds],
    );
}
