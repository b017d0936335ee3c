// A machine's running summary after a reading write, from the readings that changed: a new
// reading alone (its day read back only when it ties the day's stored point), a corrected or
// deleted one with the readings of its local day(s) and the first and last reading read back.
// The cost follows the days touched, never the length of the machine's history.
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { localDayNumber, type ReadingPoint } from '../../shared/domain';
import {
  addReadings,
  addReopenedDays,
  dayPointsOf,
  readingOrder,
  reopenedDays,
  replaceDays,
  type ReadingPlace,
  type ReadingSummary,
  type SummaryReading,
} from './daily-summary';

const DAY_MS = 86_400_000;

/** The meter whose readings are read back (the summary is per meter, migration 0026). */
interface MeterRef {
  /** the meter's id */
  id: string;
  organizationId: string;
}

/** The reference of one meter of a machine, as the functions below read it. */
export const meterRef = (machine: { organizationId: string }, meter: { id: string }): MeterRef => ({
  id: meter.id,
  organizationId: machine.organizationId,
});

interface ReadingRow {
  value: number;
  lifetime_value: number;
  taken_at: Date;
}

const toReading = (r: ReadingRow): SummaryReading => ({
  value: Number(r.value),
  lifetimeValue: Number(r.lifetime_value),
  takenAt: new Date(r.taken_at),
});

/** The day points of local days fromKey…toKey (whole day numbers, inclusive) from their readings. */
async function readDays(
  machine: MeterRef,
  fromKey: number,
  toKey: number,
  timeZone: string,
  transaction: Transaction,
): Promise<Map<number, ReadingPoint>> {
  // Local day k begins within 14 h either side of k × 24 h UTC (UTC offsets run −12 h…+14 h):
  // a day's margin each side reads every reading of those days, and the keys sort out the rest.
  const rows = await sequelize.query<ReadingRow>(
    `SELECT value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :org AND meter_id = :machine AND taken_at >= :from AND taken_at < :to
     ORDER BY taken_at, lifetime_value`,
    {
      replacements: {
        org: machine.organizationId,
        machine: machine.id,
        from: new Date((fromKey - 1) * DAY_MS),
        to: new Date((toKey + 2) * DAY_MS),
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const points = dayPointsOf(rows.map(toReading), timeZone);
  for (const key of points.keys()) if (key < fromKey || key > toKey) points.delete(key);
  return points;
}

/** The day points of a few scattered local days, one query per day. */
async function readEachDay(
  machine: MeterRef,
  keys: Iterable<number>,
  timeZone: string,
  transaction: Transaction,
) {
  const points = new Map<number, ReadingPoint>();
  for (const key of keys) {
    for (const [k, p] of await readDays(machine, key, key, timeZone, transaction)) points.set(k, p);
  }
  return points;
}

/** The first and last of a machine's readings (in taken at, lifetime value order), one query. */
async function readEnds(machine: MeterRef, transaction: Transaction) {
  const rows = await sequelize.query<ReadingRow & { end: 'first' | 'last' }>(
    `(SELECT 'first' AS end, value, lifetime_value, taken_at FROM meter_readings
      WHERE organization_id = :org AND meter_id = :machine ORDER BY taken_at, lifetime_value LIMIT 1)
     UNION ALL
     (SELECT 'last' AS end, value, lifetime_value, taken_at FROM meter_readings
      WHERE organization_id = :org AND meter_id = :machine
      ORDER BY taken_at DESC, lifetime_value DESC LIMIT 1)`,
    {
      replacements: { org: machine.organizationId, machine: machine.id },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const first = rows.find((r) => r.end === 'first');
  const last = rows.find((r) => r.end === 'last');
  return { first: first ? toReading(first) : null, last: last ? toReading(last) : null };
}

/** The summary with new readings (already written) added; O(new readings), not O(history). */
export async function summaryWithNewReadings(
  machine: MeterRef,
  stored: ReadingSummary,
  added: SummaryReading[],
  timeZone: string,
  transaction: Transaction,
): Promise<ReadingSummary> {
  const { summary, recheck } = addReadings(stored, added, timeZone);
  if (!recheck.size) return summary;
  const points = await readEachDay(machine, recheck, timeZone, transaction);
  return { ...summary, daily: replaceDays(summary.daily, recheck, points) };
}

const sameReading = (a: ReadingPlace | null, b: ReadingPlace) => !!a && readingOrder(a, b) === 0;

/**
 * The summary after one reading was corrected (`after` given) or deleted (already written): its
 * old and new local days read back, and the days that re-enter the window when the last point
 * moved back. Null when the window emptied though readings remain (every remaining reading more
 * than SUMMARY_DAYS before the removed ones): the caller then rebuilds from all readings.
 */
export async function summaryAfterChange(
  machine: MeterRef,
  stored: ReadingSummary,
  change: { before: SummaryReading; after?: SummaryReading },
  timeZone: string,
  transaction: Transaction,
): Promise<ReadingSummary | null> {
  const { before, after } = change;
  const keys = new Set(
    [before, ...(after ? [after] : [])].map((r) => Math.floor(localDayNumber(r.takenAt, timeZone))),
  );
  const points = await readEachDay(machine, keys, timeZone, transaction);
  let daily = replaceDays(stored.daily, keys, points);
  const reopened = reopenedDays(stored.daily, daily);
  if (reopened) {
    const points = await readDays(machine, reopened.fromKey, reopened.toKey, timeZone, transaction);
    daily = addReopenedDays(daily, points, reopened.cutoff);
  }
  const readingCount = stored.readingCount - (after ? 0 : 1);
  if (!daily.length && readingCount > 0) return null;

  let { first, last } = stored;
  if (sameReading(first, before) || sameReading(last, before)) {
    ({ first, last } = await readEnds(machine, transaction));
  } else if (after) {
    if (!first || readingOrder(after, first) < 0) first = after;
    if (!last || readingOrder(after, last) >= 0) last = after;
  }
  return { daily, readingCount, first, last };
}
