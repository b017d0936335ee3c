// Restricted use: a machine in service that may be used only within a limit, with the reason its
// operators see before they start ("Field only — no road: left flasher out"). Set, changed and
// lifted by the farm's technicians and managers, audited each time; the audit log is its history.
//
// A tag-out does not clear it: the fault behind a restriction (a flasher) is usually still there
// when a tagged-out machine (a cracked shield) comes back, so the limit comes back with it. While
// the machine is tagged out the tag-out rules — it may not be used at all.
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, notFound } from '../errors';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { takesRestriction } from '../policies/machine';
import { recordAudit } from '../infra/audit';

/** The machine, locked for the change, inside the caller's organization (404 otherwise). */
async function lockMachine(access: OrgAccess, id: string, transaction: Transaction) {
  const machine = await Machine.findOne({
    where: { id, organizationId: access.organization.id },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!machine) throw notFound('Machine');
  return machine;
}

/**
 * Restricts a machine (loaded for the caller already) with the reason, or changes the reason of
 * its restriction. Refused (409) on a sold machine. Sending the reason it has already is a no-op.
 */
export async function setRestriction(access: OrgAccess, loaded: Machine, reason: string) {
  return sequelize.transaction(async (transaction) => {
    const machine = await lockMachine(access, loaded.id, transaction);
    if (!takesRestriction(machine))
      throw new AppError(
        409,
        'machine_sold',
        `${machine.fleetNumber} is sold; it takes no restriction`,
      );
    const before = machine.restrictionReason;
    if (before === reason) return machine;
    await machine.update(
      { restrictionReason: reason, restrictedAt: new Date(), restrictedBy: access.userId },
      { transaction },
    );
    await recordAudit(
      {
        organizationId: machine.organizationId,
        actorUserId: access.userId,
        action: 'machine.restrict',
        entityType: 'machine',
        entityId: machine.id,
        changes: { reason, before },
      },
      transaction,
    );
    return machine;
  });
}

/** Lifts a machine's restriction, with an optional note of what was done. 409 when it has none. */
export async function liftRestriction(access: OrgAccess, loaded: Machine, note: string) {
  return sequelize.transaction(async (transaction) => {
    const machine = await lockMachine(access, loaded.id, transaction);
    const reason = machine.restrictionReason;
    if (reason == null)
      throw new AppError(
        409,
        'not_restricted',
        `${machine.fleetNumber} is not restricted; there is nothing to lift`,
      );
    await machine.update(
      { restrictionReason: null, restrictedAt: null, restrictedBy: null },
      { transaction },
    );
    await recordAudit(
      {
        organizationId: machine.organizationId,
        actorUserId: access.userId,
        action: 'machine.lift_restriction',
        entityType: 'machine',
        entityId: machine.id,
        changes: { reason, note },
      },
      transaction,
    );
    return machine;
  });
}
