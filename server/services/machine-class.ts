// Applying the service library's set of a machine class to a machine, in one step. The machine
// is given the class and the class's tasks it does not have yet (by name, case aside): applying
// the same class twice adds nothing, and tasks already on the machine are kept as they are. The
// tasks are added without a last service, so on a machine that came with hours each one is
// "history unknown" until someone says when it was last done or counts it from now.
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { Machine, ServiceTask } from '../models';
import { METER_UNIT_LABELS, type MeterUnit } from '../../shared/constants';
import {
  classMeterUnits,
  MACHINE_CLASS_LABELS,
  serviceLibraryClass,
  type MachineClass,
} from '../../shared/domain/service-library';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import { addTasks } from './schedules';
import { applySheetToTasks } from './spec-sheets';

/**
 * Why a class cannot go on a machine whose meter counts in `own`, or null: a class goes on a
 * meter in its own unit or in one of its variants' (the truck in miles, a baler in bales).
 */
export function machineClassProblem(own: MeterUnit, machineClass: MachineClass): string | null {
  const units = classMeterUnits(machineClass);
  if (units.includes(own)) return null;
  const counts = units.map((u) => METER_UNIT_LABELS[u]).join(' or ');
  return `The ${MACHINE_CLASS_LABELS[machineClass].toLowerCase()} schedule counts in ${counts}, but this machine's meter counts in ${METER_UNIT_LABELS[own]}; pick a class that counts in ${METER_UNIT_LABELS[own]} or change the meter unit first`;
}

/** Gives the machine the class and adds the class's missing tasks, in the caller's transaction. */
export async function applyMachineClassIn(
  access: OrgAccess,
  machine: Machine,
  machineClass: MachineClass,
  transaction: Transaction,
): Promise<{ added: ServiceTask[]; kept: string[] }> {
  // one apply at a time per machine, so two clicks cannot add the same tasks twice
  await Machine.findOne({
    where: { id: machine.id, organizationId: access.organization.id },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  const existing = await ServiceTask.findAll({
    where: { organizationId: access.organization.id, machineId: machine.id },
    attributes: ['name'],
    transaction,
  });
  const have = new Set(existing.map((t) => t.name.trim().toLowerCase()));
  // in the machine's own unit: a miles truck gets miles, a bale-counting baler bales
  const { tasks } = serviceLibraryClass(machineClass, machine.meterUnit);
  const missing = tasks.filter((t) => !have.has(t.name.trim().toLowerCase()));
  const kept = tasks.filter((t) => have.has(t.name.trim().toLowerCase())).map((t) => t.name);
  const before = machine.machineClass ?? null;
  if (before !== machineClass) await machine.update({ machineClass }, { transaction });
  const added = missing.length
    ? await addTasks(access, machine, missing, 'task.create_from_library', transaction)
    : [];
  // the added tasks take their volumes and filter numbers from the machine's spec sheet
  if (added.length) {
    await applySheetToTasks(access.organization.id, machine.id, transaction);
    await Promise.all(added.map((t) => t.reload({ transaction })));
  }
  if (before !== machineClass || added.length)
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'machine.apply_class',
        entityType: 'machine',
        entityId: machine.id,
        changes: { before, after: machineClass, added: added.length, kept: kept.length },
      },
      transaction,
    );
  return { added, kept };
}

/** Applies a class to a machine (422 naming machineClass when its meter unit does not fit). */
export async function applyMachineClass(
  access: OrgAccess,
  machine: Machine,
  machineClass: MachineClass,
) {
  const problem = machineClassProblem(machine.meterUnit, machineClass);
  if (problem) throw invalid({ machineClass: problem });
  return sequelize.transaction((t) => applyMachineClassIn(access, machine, machineClass, t));
}
