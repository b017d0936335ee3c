import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, forbidden, invalid, notFound } from '../errors';
import { Defect, Machine, Membership, ServiceRecord } from '../models';
import type {
  DefectCloseInput,
  DefectCreateInput,
  DefectSeverity,
  DefectUpdateInput,
} from '../../shared/schemas/defects';
import type { OrgAccess } from '../policies/access';
import { loadMachine } from './machines';
import { recordAudit } from '../infra/audit';
import { openCriticalDefects, tagOut } from './machine-status';

const SEVERITY_RANK: Record<DefectSeverity, number> = { critical: 0, major: 1, minor: 2 };
const ACTIVE = ['open', 'in_repair'] as const;

/** What an operator is told about a tagged-out machine, word for word everywhere. */
export const taggedOutMessage = (machine: Machine) =>
  `${machine.fleetNumber} is tagged out: do not use it until a technician or manager clears it`;

/** The defect if it is in the caller's organization on a machine they may see; else 404. */
export async function loadDefect(access: OrgAccess, defectId: string, transaction?: Transaction) {
  const defect = await Defect.findOne({
    where: { id: defectId, organizationId: access.organization.id },
    transaction,
    ...(transaction && { lock: transaction.LOCK.UPDATE }),
  });
  if (!defect) throw notFound('Defect');
  const { machine } = await loadMachine(access, defect.machineId, transaction).catch(() => {
    throw notFound('Defect');
  });
  return { defect, machine };
}

const audit = (
  access: OrgAccess,
  action: string,
  entityType: string,
  entityId: string,
  changes: Record<string, unknown>,
  transaction: Transaction,
) =>
  recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType,
      entityId,
      changes,
    },
    transaction,
  );

interface DefectSource {
  walkaroundId?: string | null;
  itemId?: string | null;
  photoId?: string | null;
}

/**
 * Raises a defect. A defect still active for the same checklist item is reported again instead of
 * doubled (its severity rises if the new report is worse). A critical defect tags the machine out.
 */
export async function raiseDefect(
  access: OrgAccess,
  machine: Machine,
  input: DefectCreateInput,
  source: DefectSource,
  transaction: Transaction,
): Promise<{ defect: Defect; created: boolean; taggedOut: boolean }> {
  const existing = source.itemId
    ? await Defect.findOne({
        where: {
          organizationId: machine.organizationId,
          machineId: machine.id,
          itemId: source.itemId,
          status: { [Op.in]: [...ACTIVE] },
        },
        transaction,
      })
    : null;
  let defect: Defect;
  if (existing) {
    const worse = SEVERITY_RANK[input.severity] < SEVERITY_RANK[existing.severity];
    await existing.update(
      {
        reportCount: existing.reportCount + 1,
        lastReportedAt: new Date(),
        walkaroundId: source.walkaroundId ?? existing.walkaroundId,
        photoId: source.photoId ?? existing.photoId,
        ...(worse && { severity: input.severity }),
        ...(input.description && {
          description: existing.description
            ? `${existing.description}\n${input.description}`
            : input.description,
        }),
      },
      { transaction },
    );
    defect = existing;
  } else {
    defect = await Defect.create(
      {
        organizationId: machine.organizationId,
        machineId: machine.id,
        title: input.title,
        description: input.description,
        severity: input.severity,
        walkaroundId: source.walkaroundId ?? null,
        itemId: source.itemId ?? null,
        photoId: source.photoId ?? null,
        reportedBy: access.userId,
        assignedTo: null,
        fixedAt: null,
        fixedBy: null,
        fixedByRecordId: null,
      },
      { transaction },
    );
    await audit(
      access,
      'defect.report',
      'defect',
      defect.id,
      { machineId: machine.id, title: defect.title, severity: defect.severity },
      transaction,
    );
  }
  const taggedOut =
    defect.severity === 'critical' &&
    (await tagOut(
      access,
      machine,
      `${source.walkaroundId ? 'Critical fail on a walkaround' : 'Critical defect reported'}: ${defect.title}`,
      transaction,
    ));
  return { defect, created: !existing, taggedOut };
}

async function checkAssignee(access: OrgAccess, userId: string, transaction: Transaction) {
  const member = await Membership.findOne({
    where: { organizationId: access.organization.id, userId },
    transaction,
  });
  if (!member || !['manager', 'technician'].includes(member.role))
    throw invalid({ assignedTo: 'Assign a technician or manager of this farm' });
}

/** A defect reported from the machine's page, in its own transaction (see raiseDefect). */
export const reportDefect = (access: OrgAccess, machine: Machine, input: DefectCreateInput) =>
  sequelize.transaction((transaction) => raiseDefect(access, machine, input, {}, transaction));

/**
 * Assigns, re-titles, re-grades or moves a defect between open and in repair. Raising it to
 * critical tags the machine out; lowering it never returns the machine to service.
 */
export async function updateDefect(access: OrgAccess, defectId: string, input: DefectUpdateInput) {
  return sequelize.transaction(async (transaction) => {
    const { defect, machine } = await loadDefect(access, defectId, transaction);
    if (defect.status === 'fixed')
      throw new AppError(409, 'defect_closed', 'This defect is closed (fixed); it cannot change');
    if (input.assignedTo) await checkAssignee(access, input.assignedTo, transaction);
    const before = Object.fromEntries(
      Object.keys(input).map((k) => [k, defect.get(k as keyof Defect)]),
    );
    await defect.update(input, { transaction });
    await audit(
      access,
      'defect.update',
      'defect',
      defect.id,
      { machineId: machine.id, before, after: input },
      transaction,
    );
    if (input.severity === 'critical')
      await tagOut(access, machine, `Defect raised to critical: ${defect.title}`, transaction);
    return { defect, machine };
  });
}

/** The refusal a dealer gets for any attempt on a farm's defects: it names no defect. */
export const DEALER_DEFECTS_REFUSAL =
  "Defects are the farm's own: only its technicians and managers close them. Record the service without closing defects.";

/**
 * Closes defects of one machine as fixed, in the caller's transaction (a service record's, or
 * its own). Each must be active on this machine; a bad one is named by `field.index`. The
 * machine's status does not change: a tagged-out machine stays so until someone returns it to
 * service (services/machine-status.ts). Farm members only: a dealer is refused before any lookup.
 */
export async function closeDefects(
  access: OrgAccess,
  machine: Machine,
  defectIds: string[],
  fix: { note: string; serviceRecordId: string | null },
  transaction: Transaction,
  field = 'defectIds',
): Promise<Defect[]> {
  if (!defectIds.length) return [];
  if (access.via !== 'member') throw forbidden(DEALER_DEFECTS_REFUSAL);
  const rows = await Defect.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: defectIds } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  const byId = new Map(rows.map((d) => [d.id, d]));
  const errors: Record<string, string> = {};
  defectIds.forEach((id, i) => {
    const d = byId.get(id);
    if (!d || d.machineId !== machine.id)
      errors[`${field}.${i}`] = `No such defect on ${machine.fleetNumber}`;
    else if (d.status === 'fixed') errors[`${field}.${i}`] = `"${d.title}" is closed already`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
  const now = new Date();
  const closed = [...new Set(defectIds)].map((id) => byId.get(id)!);
  for (const d of closed) {
    await d.update(
      {
        status: 'fixed',
        fixedAt: now,
        fixedBy: access.userId,
        fixedByRecordId: fix.serviceRecordId,
        fixNote: fix.note,
      },
      { transaction },
    );
    await audit(
      access,
      'defect.close',
      'defect',
      d.id,
      { machineId: machine.id, serviceRecordId: fix.serviceRecordId, note: fix.note },
      transaction,
    );
  }
  return closed;
}

/**
 * Closes one defect with a note, or by a completed service record of the same machine. Answers
 * how many critical defects the machine still has open, for the "stays tagged out" notice.
 */
export async function closeDefect(access: OrgAccess, defectId: string, input: DefectCloseInput) {
  return sequelize.transaction(async (transaction) => {
    const { defect, machine } = await loadDefect(access, defectId, transaction);
    if (defect.status === 'fixed')
      throw new AppError(409, 'defect_closed', `"${defect.title}" is closed already`);
    if (input.serviceRecordId) {
      const record = await ServiceRecord.findOne({
        where: { id: input.serviceRecordId, organizationId: access.organization.id },
        transaction,
      });
      if (!record || record.machineId !== machine.id)
        throw invalid({ serviceRecordId: `No such service record on ${machine.fleetNumber}` });
      if (record.status !== 'completed')
        throw invalid({ serviceRecordId: 'Link a completed service record' });
    }
    const [closed] = await closeDefects(
      access,
      machine,
      [defect.id],
      { note: input.note, serviceRecordId: input.serviceRecordId ?? null },
      transaction,
    );
    const openCritical = (await openCriticalDefects(machine, transaction)).length;
    return { defect: closed, machine, openCritical };
  });
}
