// A machine's meters (issue 13): listed with each one's last reading, added, renamed, removed
// while nothing is recorded on them, and one made primary (the meter a reading, task or import
// without a meter id goes on, and whose unit machines.meter_unit shows). Each change is audited.
import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid, notFound } from '../errors';
import { MachineForecast, MachineMeter, type Machine } from '../models';
import { METER_KIND_LABELS, METER_KIND_UNITS } from '../../shared/constants';
import type { MeterCreateInput, MeterUpdateInput } from '../../shared/schemas/meters';
import type { OrgAccess } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { recomputeDuePoints } from './forecast';
import { lockMachineReadings } from './reading-neighbours';

const ORDER: [string, string][] = [
  ['isPrimary', 'DESC'],
  ['position', 'ASC'],
  ['createdAt', 'ASC'],
];

/** The machine's meters (primary first), each with its stored summary and how many tasks use it. */
export async function listMeters(access: OrgAccess, machine: Machine) {
  const organizationId = access.organization.id;
  const meters = await MachineMeter.findAll({
    where: { organizationId, machineId: machine.id },
    order: ORDER,
  });
  const ids = meters.map((m) => m.id);
  const [forecasts, tasks] = await Promise.all([
    MachineForecast.findAll({ where: { organizationId, meterId: { [Op.in]: ids } } }),
    sequelize.query<{ meter_id: string; n: number }>(
      `SELECT meter_id, count(*)::int AS n FROM service_tasks
       WHERE organization_id = :organizationId AND machine_id = :machineId GROUP BY meter_id`,
      { replacements: { organizationId, machineId: machine.id }, type: QueryTypes.SELECT },
    ),
  ]);
  const forecastOf = new Map(forecasts.map((f) => [f.meterId, f]));
  const tasksOf = new Map(tasks.map((t) => [t.meter_id, t.n]));
  return meters.map((meter) => ({
    meter,
    forecast: forecastOf.get(meter.id) ?? null,
    taskCount: tasksOf.get(meter.id) ?? 0,
  }));
}

/** One meter of the machine, or 404. */
export async function loadMeter(
  access: OrgAccess,
  machine: Machine,
  meterId: string,
  transaction?: Transaction,
) {
  const meter = await MachineMeter.findOne({
    where: { id: meterId, organizationId: access.organization.id, machineId: machine.id },
    transaction,
  });
  if (!meter) throw notFound('Meter');
  return meter;
}

const audit = (
  access: OrgAccess,
  action: string,
  meter: MachineMeter,
  changes: Record<string, unknown>,
  transaction: Transaction,
) =>
  recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType: 'machine_meter',
      entityId: meter.id,
      changes: { machineId: meter.machineId, kind: meter.kind, ...changes },
    },
    transaction,
  );

/** The 422 of a second meter with the same kind and label on one machine. */
const sameName = (input: { kind: MeterCreateInput['kind']; label: string }) =>
  invalid({
    label: `This machine already has a ${METER_KIND_LABELS[input.kind]} meter${input.label ? ` labelled "${input.label}"` : ' without a label'}; give this one a label of its own`,
  });

/** Adds a meter to the machine (after its others), with an empty summary so it is never stale. */
export async function addMeter(access: OrgAccess, machine: Machine, input: MeterCreateInput) {
  return sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    const last = await MachineMeter.max<number, MachineMeter>('position', {
      where: { machineId: machine.id },
      transaction,
    });
    const meter = await MachineMeter.create(
      {
        organizationId: access.organization.id,
        machineId: machine.id,
        kind: input.kind,
        unit: METER_KIND_UNITS[input.kind],
        label: input.label,
        position: (last ?? 0) + 1,
      },
      { transaction },
    ).catch((err: unknown) => {
      if (err instanceof UniqueConstraintError) throw sameName(input);
      throw err;
    });
    await recomputeDuePoints(access.organization.id, [machine.id], {
      transaction,
      timeZone: access.organization.timeZone,
    });
    await audit(access, 'meter.add', meter, { label: meter.label }, transaction);
    return meter;
  });
}

/** Renames or moves a meter: only the fields sent. */
export async function updateMeter(
  access: OrgAccess,
  machine: Machine,
  meterId: string,
  input: MeterUpdateInput,
) {
  return sequelize.transaction(async (transaction) => {
    const meter = await loadMeter(access, machine, meterId, transaction);
    const before = { label: meter.label, position: meter.position };
    await meter.update(input, { transaction }).catch((err: unknown) => {
      if (err instanceof UniqueConstraintError)
        throw sameName({ kind: meter.kind, label: input.label ?? meter.label });
      throw err;
    });
    await audit(access, 'meter.update', meter, { before, after: input }, transaction);
    return meter;
  });
}

/**
 * Removes a meter that nothing is recorded on: not the primary, and only without readings,
 * replacements or tasks (422 naming what is in the way; nothing changes).
 */
export async function removeMeter(access: OrgAccess, machine: Machine, meterId: string) {
  await sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    const meter = await loadMeter(access, machine, meterId, transaction);
    if (meter.isPrimary)
      throw invalid({
        meter: 'The primary meter cannot be removed; make another meter primary first',
      });
    const [uses] = await sequelize.query<{ readings: number; tasks: number }>(
      `SELECT (SELECT count(*)::int FROM meter_readings WHERE organization_id = :org AND meter_id = :id) AS readings,
              (SELECT count(*)::int FROM meter_replacements WHERE organization_id = :org AND meter_id = :id)
            + (SELECT count(*)::int FROM service_tasks WHERE organization_id = :org AND meter_id = :id) AS tasks`,
      {
        replacements: { org: access.organization.id, id: meter.id },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (uses.readings || uses.tasks) {
      const what = [
        uses.readings && `${uses.readings} reading${uses.readings === 1 ? '' : 's'}`,
        uses.tasks && `${uses.tasks} task${uses.tasks === 1 ? '' : 's'} or meter changes`,
      ].filter(Boolean);
      throw invalid({
        meter: `This meter has ${what.join(' and ')}; only a meter with no readings and no tasks can be removed`,
      });
    }
    await meter.destroy({ transaction });
    await audit(access, 'meter.remove', meter, { label: meter.label }, transaction);
  });
}

/**
 * Makes the meter the machine's primary: the one a reading, task or import without a meter id
 * goes on from now on. The machine's meter unit follows (the one screens and lists show).
 */
export async function makePrimary(access: OrgAccess, machine: Machine, meterId: string) {
  return sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    const meter = await loadMeter(access, machine, meterId, transaction);
    if (meter.isPrimary) return meter;
    const where = { organizationId: access.organization.id, machineId: machine.id };
    // the partial unique index allows one primary at a time: the old one first
    await MachineMeter.update(
      { isPrimary: false },
      { where: { ...where, isPrimary: true }, transaction },
    );
    await meter.update({ isPrimary: true }, { transaction });
    await machine.update({ meterUnit: meter.unit }, { transaction });
    await audit(access, 'meter.primary', meter, { label: meter.label }, transaction);
    return meter;
  });
}
