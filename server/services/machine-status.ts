// A machine's safety state: tagging it out, and returning it to service as its own noted step.
// Closing defects never changes the status: a person who has checked the machine releases it.
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, invalid, notFound } from '../errors';
import { AuditEvent, Defect, Machine } from '../models';
import type { MachineStatus } from '../../shared/constants';
import type { OrgAccess } from '../policies/access';
import { queueTagOutMail } from './tag-out-mail';

const ACTIVE = ['open', 'in_repair'] as const;
const STATUS_ACTIONS = [
  'machine.tag_out',
  'machine.return_to_service',
  'machine.clear_tag_out',
] as const;

/** Open (or in repair) critical defects of a machine. */
export const openCriticalDefects = (machine: Machine, transaction?: Transaction) =>
  Defect.findAll({
    where: {
      organizationId: machine.organizationId,
      machineId: machine.id,
      severity: 'critical',
      status: { [Op.in]: [...ACTIVE] },
    },
    order: [['createdAt', 'ASC']],
    transaction,
  });

/**
 * Tags a machine out (only one in service: a sold one stays sold, a tagged-out one is not tagged
 * twice), audits it and queues the e-mail to the farm's managers and technicians, all in the
 * caller's transaction. The conditional UPDATE makes two tag-outs at once count as one.
 * Returns whether the status changed.
 */
export async function tagOut(
  access: OrgAccess,
  machine: Machine,
  reason: string,
  transaction: Transaction,
): Promise<boolean> {
  const [changed] = await Machine.update(
    { status: 'tagged_out' },
    {
      where: { id: machine.id, organizationId: machine.organizationId, status: 'in_service' },
      transaction,
    },
  );
  if (!changed) return false;
  await machine.reload({ transaction });
  const event = await AuditEvent.create(
    {
      organizationId: machine.organizationId,
      actorUserId: access.userId,
      action: 'machine.tag_out',
      entityType: 'machine',
      entityId: machine.id,
      changes: { reason },
    },
    { transaction },
  );
  await queueTagOutMail(
    access.organization,
    machine,
    {
      eventId: `machine.tag_out:${event.id}`,
      at: event.createdAt,
      reason,
      actorUserId: access.userId,
    },
    transaction,
  );
  return true;
}

/** "2 critical defects are still open (1 in repair)": counts only, never titles. */
function openCriticalSentence(defects: Defect[]) {
  const inRepair = defects.filter((d) => d.status === 'in_repair').length;
  const n = defects.length;
  return `${n} critical ${n === 1 ? 'defect is' : 'defects are'} still open${inRepair ? ` (${inRepair} in repair)` : ''}`;
}

export const RETURN_TO_SERVICE_STEP =
  'A tagged-out machine goes back into service with its own step: "Return to service" on its page, with a note of what was checked';

/**
 * A status sent with a machine edit: back into service from a tag-out is refused (it is its own
 * step), and tagging out by hand goes through tagOut (audit and e-mail). Answers the edit's
 * other fields (without the status when tagOut handled it).
 */
export async function applyStatusEdit<T extends { status?: MachineStatus }>(
  access: OrgAccess,
  machine: Machine,
  input: T,
  transaction: Transaction,
): Promise<T> {
  if (input.status === undefined || input.status === machine.status) return input;
  if (machine.status === 'tagged_out' && input.status === 'in_service')
    throw invalid({ status: RETURN_TO_SERVICE_STEP });
  if (input.status !== 'tagged_out') return input;
  if (!(await tagOut(access, machine, 'Tagged out by hand on the machine page', transaction)))
    return input;
  const { status: _done, ...rest } = input;
  return rest as T;
}

/**
 * Returns a tagged-out machine (loaded for the caller already) to service with the note of what
 * was checked. Refused (409) while a critical defect is open or in repair, and when it is not
 * tagged out.
 */
export async function returnToService(access: OrgAccess, loaded: Machine, note: string) {
  return sequelize.transaction(async (transaction) => {
    const machine = await Machine.findOne({
      where: { id: loaded.id, organizationId: access.organization.id },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!machine) throw notFound('Machine');
    if (machine.status !== 'tagged_out')
      throw new AppError(
        409,
        'not_tagged_out',
        `${machine.fleetNumber} is not tagged out; there is nothing to return to service`,
      );
    const critical = await openCriticalDefects(machine, transaction);
    if (critical.length)
      throw new AppError(
        409,
        'critical_defects_open',
        `${machine.fleetNumber} stays tagged out: ${openCriticalSentence(critical)}. Close ${critical.length === 1 ? 'it' : 'them'} first, then return it to service.`,
      );
    await machine.update({ status: 'in_service' }, { transaction });
    await AuditEvent.create(
      {
        organizationId: machine.organizationId,
        actorUserId: access.userId,
        action: 'machine.return_to_service',
        entityType: 'machine',
        entityId: machine.id,
        changes: { note },
      },
      { transaction },
    );
    return machine;
  });
}

export interface TagOutState {
  since: string | null;
  reason: string | null;
  openCriticalDefects: number | null;
}

/**
 * Why and since when a machine is tagged out, for its page; null when it is not. A dealer is told
 * that it is and since when, never why nor how many defects (those are the farm's own).
 */
export async function tagOutState(
  access: OrgAccess,
  machine: Machine,
): Promise<TagOutState | null> {
  if (machine.status !== 'tagged_out') return null;
  // the latest status event: a tag-out after the last return to service is the current one
  const last = await AuditEvent.findOne({
    where: {
      organizationId: machine.organizationId,
      entityType: 'machine',
      entityId: machine.id,
      action: { [Op.in]: [...STATUS_ACTIONS] },
    },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const event = last?.action === 'machine.tag_out' ? last : null;
  const farm = access.via === 'member';
  const reason = event?.changes.reason;
  return {
    since: event ? event.createdAt.toISOString() : null,
    reason: farm && typeof reason === 'string' ? reason : null,
    openCriticalDefects: farm ? (await openCriticalDefects(machine)).length : null,
  };
}
