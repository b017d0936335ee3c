// What the log-hours screens call: a machine's reading history, one reading, many at once, and
// the machines that still take readings. Every write goes through writeReadings (readings.ts).
import { sequelize } from '../db';
import { AppError, invalid } from '../errors';
import { meterNotFound } from './meter-changes';
import { MachineMeter, MeterReading, MeterReplacement, type Machine } from '../models';
import type { OrgAccess } from '../policies/context';
import type { BulkReadingsInput, ReadingCreateInput } from '../../shared/schemas/readings';
import { authorize } from '../policies/access';
import {
  canLogReading,
  logReadingRefusal,
  readingsClosedMessage,
  takesReadings,
} from '../policies/machine';
import { listMachines, loadMachine, loadVisibleMachines } from './machines';
import { writeReadings, type NewReading } from './readings';

/**
 * A meter's readings (newest first, at most `limit`) and its replacements and counter resets: of
 * the meter `meterId` names, else of the machine's primary meter (as before several meters).
 */
export async function readingHistory(
  access: OrgAccess,
  machine: Machine,
  limit: number,
  meterId?: string,
) {
  const primary = meterId
    ? null
    : await MachineMeter.findOne({
        where: { machineId: machine.id, isPrimary: true },
        attributes: ['id'],
      });
  const where = {
    organizationId: access.organization.id,
    machineId: machine.id,
    meterId: meterId ?? primary!.id,
  };
  const [readings, replacements] = await Promise.all([
    MeterReading.findAll({
      where,
      order: [
        ['takenAt', 'DESC'],
        ['lifetimeValue', 'DESC'],
      ],
      limit,
    }),
    MeterReplacement.findAll({
      where,
      order: [['replacedAt', 'DESC']],
    }),
  ]);
  return { readings, replacements };
}

/**
 * Logs one manual reading (now unless `takenAt` is given); an identical repeat is ignored. The
 * machine is loaded, visibility-checked and locked in one statement inside the write's
 * transaction, then the caller's right to log on it is checked (403 as before).
 */
export async function logReading(access: OrgAccess, machineId: string, input: ReadingCreateInput) {
  const [outcome] = await sequelize.transaction(async (transaction) => {
    const { machine } = await loadMachine(access, machineId, transaction, { lock: true });
    authorize(canLogReading(access, machine), logReadingRefusal(machine));
    return writeReadings(
      access,
      [
        {
          machine,
          meterId: input.meterId,
          value: input.value,
          takenAt: input.takenAt ? new Date(input.takenAt) : new Date(),
          source: 'manual',
        },
      ],
      transaction,
      { locked: true },
    ).catch((err: unknown) => {
      // another machine's (or farm's) meter id: not found, as the machine itself would be
      if (err instanceof AppError && err.fields?.meterId) throw meterNotFound();
      throw err;
    });
  });
  return outcome;
}

/**
 * Logs manual readings for many machines in one transaction, all or nothing: a machine the caller
 * cannot see, or one that takes no readings, is a 422 naming its row (`readings.i.machineId`).
 */
export async function logBulkReadings(access: OrgAccess, readings: BulkReadingsInput['readings']) {
  const items: NewReading[] = [];
  const missing: Record<string, string> = {};
  const machines = await loadVisibleMachines(
    access,
    readings.map((r) => r.machineId),
  );
  for (const [i, r] of readings.entries()) {
    const machine = machines.get(r.machineId);
    if (!machine) {
      missing[`readings.${i}.machineId`] = 'No such machine in this farm';
      continue;
    }
    if (!canLogReading(access, machine))
      missing[`readings.${i}.machineId`] = readingsClosedMessage(machine.fleetNumber);
    items.push({
      machine,
      meterId: r.meterId,
      value: r.value,
      takenAt: r.takenAt ? new Date(r.takenAt) : new Date(),
      source: 'manual' as const,
    });
  }
  if (Object.keys(missing).length) throw invalid(missing);
  const outcomes = await sequelize.transaction((transaction) =>
    writeReadings(access, items, transaction, { fieldPrefix: (i) => `readings.${i}.` }),
  );
  return outcomes.map((o) => ({
    machineId: items[o.index].machine.id,
    meterId: o.meterId,
    status: o.status,
  }));
}

/** Every machine the caller sees that still takes readings, by fleet number, with its forecast. */
export async function machinesTakingReadings(access: OrgAccess) {
  const { items } = await listMachines(access, {
    sort: 'fleetNumber',
    order: 'asc',
    page: 1,
    pageSize: 10_000,
  });
  return items.filter((i) => takesReadings(i.machine));
}
