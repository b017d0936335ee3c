// What every reading rule is checked against, read in one statement: a machine's meter
// replacements, the readings either side of a time window and its stored summary; and the row
// lock that serialises a machine's writers.
import { QueryTypes, type Transaction } from 'sequelize';
import { format } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { sequelize } from '../db';
import type { Machine } from '../models';
import type { MeterReplacementPoint, ReadingPoint } from '../../shared/domain';
import { summaryFromColumns } from './daily-summary';

export interface Neighbour {
  id: string;
  value: number;
  lifetimeValue: number;
  takenAtMs: number;
}

/** A formatter of instants in the organization's time zone, for messages. */
export const timeFormatter = (timeZone: string) => (ms: number) =>
  `${format(new TZDate(ms, timeZone), 'yyyy-MM-dd HH:mm')} (${timeZone})`;

// Existing readings of a machine from the one before :from to the one after :to.
const AROUND_SQL = `SELECT id, value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :org AND machine_id = :machine
       AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at < :from), '-infinity')
       AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at > :to), 'infinity')`;

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

interface ContextRow {
  replacements: { replacedAt: string; oldFinalValue: number; newStartValue: number }[];
  neighbours: NeighbourRow[];
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
 * What a batch of new readings of one machine is checked and summarised against, read in one
 * statement after the machine's lock is held (so nothing in it is stale): the meter replacements,
 * the existing readings around the batch's times, and the stored summary (null if none yet).
 */
export async function writeContext(
  machine: Machine,
  fromMs: number,
  toMs: number,
  transaction: Transaction,
) {
  const [row] = await sequelize.query<ContextRow>(
    `SELECT f.machine_id IS NOT NULL AS has_summary, f.daily, f.reading_count, f.last_value,
            f.last_raw_value, f.last_taken_at, f.first_taken_at, f.first_value,
            (SELECT coalesce(json_agg(json_build_object('replacedAt', r.replaced_at,
                      'oldFinalValue', r.old_final_value, 'newStartValue', r.new_start_value)), '[]')
             FROM meter_replacements r
             WHERE r.organization_id = :org AND r.machine_id = :machine) AS replacements,
            (SELECT coalesce(json_agg(n ORDER BY n.taken_at, n.lifetime_value), '[]')
             FROM (${AROUND_SQL}) n) AS neighbours
     FROM machines m LEFT JOIN machine_forecasts f ON f.machine_id = m.id
     WHERE m.id = :machine`,
    {
      replacements: {
        org: machine.organizationId,
        machine: machine.id,
        from: new Date(fromMs),
        to: new Date(toMs),
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
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
        lastTakenAt: row.last_taken_at,
        firstTakenAt: row.first_taken_at,
        firstValue: row.first_value,
      })
    : null;
  return { replacements, neighbours: row.neighbours.map(toNeighbour), summary };
}

/**
 * Serialises every writer of one machine's readings (new, corrected, deleted) on the machine's row,
 * so two people editing at once cannot each pass the neighbour checks against a stale neighbour.
 */
export async function lockMachineReadings(machineId: string, transaction: Transaction) {
  await sequelize.query('SELECT id FROM machines WHERE id = :id FOR UPDATE', {
    replacements: { id: machineId },
    transaction,
  });
}
