// The queries every reading rule is checked against: a machine's meter replacements, the
// readings either side of a time window, and the row lock that serialises a machine's writers.
import { QueryTypes, type Transaction } from 'sequelize';
import { format } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { sequelize } from '../db';
import { MeterReplacement, type Machine } from '../models';
import type { MeterReplacementPoint } from '../../shared/domain';

export interface Neighbour {
  id: string;
  value: number;
  lifetimeValue: number;
  takenAtMs: number;
}

/** A formatter of instants in the organization's time zone, for messages. */
export const timeFormatter = (timeZone: string) => (ms: number) =>
  `${format(new TZDate(ms, timeZone), 'yyyy-MM-dd HH:mm')} (${timeZone})`;

/** The machine's meter replacements, as the lifetime-value math takes them. */
export async function replacementsOf(
  machine: Machine,
  transaction: Transaction,
): Promise<MeterReplacementPoint[]> {
  const rows = await MeterReplacement.findAll({
    where: { organizationId: machine.organizationId, machineId: machine.id },
    transaction,
  });
  return rows.map((r) => ({
    replacedAtMs: r.replacedAt.getTime(),
    oldFinalValue: r.oldFinalValue,
    newStartValue: r.newStartValue,
  }));
}

/** Existing readings of a machine from the one before `fromMs` to the one after `toMs`. */
export async function readingsAround(
  machine: Machine,
  fromMs: number,
  toMs: number,
  transaction: Transaction,
) {
  const rows = await sequelize.query<{
    id: string;
    value: number;
    lifetime_value: number;
    taken_at: Date;
  }>(
    `SELECT id, value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :org AND machine_id = :machine
       AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at < :from), '-infinity')
       AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at > :to), 'infinity')
     ORDER BY taken_at, lifetime_value`,
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
  return rows.map<Neighbour>((r) => ({
    id: r.id,
    value: Number(r.value),
    lifetimeValue: Number(r.lifetime_value),
    takenAtMs: new Date(r.taken_at).getTime(),
  }));
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
