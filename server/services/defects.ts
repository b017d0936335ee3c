import { Op, QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, invalid, notFound } from '../errors';
import { Defect, Machine, Membership, ServiceRecord } from '../models';
import type {
  DefectCloseInput,
  DefectCreateInput,
  DefectListQuery,
  DefectSeverity,
  DefectUpdateInput,
} from '../../shared/schemas/defects';
import { hasRole, type OrgAccess } from '../policies/access';
import { loadMachine } from './machines';
import { recordAudit } from './audit';

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

/** Tags a machine out (a sold one stays sold). Returns whether its status changed. */
export async function tagOut(
  access: OrgAccess,
  machine: Machine,
  reason: string,
  transaction: Transaction,
): Promise<boolean> {
  if (machine.status !== 'in_service') return false;
  await machine.update({ status: 'tagged_out' }, { transaction });
  await audit(access, 'machine.tag_out', 'machine', machine.id, { reason }, transaction);
  return true;
}

/**
 * The machine's status follows its defects: once the last critical defect is closed, a tagged-out
 * machine returns to service.
 */
async function followDefects(access: OrgAccess, machine: Machine, transaction: Transaction) {
  if (machine.status !== 'tagged_out') return;
  if ((await openCriticalDefects(machine, transaction)).length) return;
  await machine.update({ status: 'in_service' }, { transaction });
  await audit(
    access,
    'machine.return_to_service',
    'machine',
    machine.id,
    { reason: 'no critical defect remains open' },
    transaction,
  );
}

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
    (await tagOut(access, machine, `critical defect: ${defect.title}`, transaction));
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

/** Assigns, re-titles, re-grades or moves a defect between open and in repair; the machine follows. */
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
      await tagOut(access, machine, `critical defect: ${defect.title}`, transaction);
    else if (before.severity === 'critical') await followDefects(access, machine, transaction);
    return { defect, machine };
  });
}

/**
 * Closes defects of one machine as fixed, in the caller's transaction (a service record's, or
 * its own). Each must be active on this machine; a bad one is named by `field.index`.
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
  if (closed.some((d) => d.severity === 'critical'))
    await followDefects(access, machine, transaction);
  return closed;
}

/** Closes one defect with a note, or by a completed service record of the same machine. */
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
    return { defect: closed, machine };
  });
}

/** Returns a tagged-out machine to service; refused while a critical defect is still open. */
export async function clearTagOut(access: OrgAccess, machineId: string, note: string) {
  return sequelize.transaction(async (transaction) => {
    const { machine } = await loadMachine(access, machineId, transaction);
    await sequelize.query('SELECT id FROM machines WHERE id = :id FOR UPDATE', {
      replacements: { id: machine.id },
      transaction,
    });
    await machine.reload({ transaction });
    if (machine.status !== 'tagged_out')
      throw new AppError(409, 'not_tagged_out', `${machine.fleetNumber} is not tagged out`);
    const critical = await openCriticalDefects(machine, transaction);
    if (critical.length) {
      const list = critical.map((d) => `"${d.title}" (${d.status.replace('_', ' ')})`).join(', ');
      throw new AppError(
        409,
        'critical_defects_open',
        `${machine.fleetNumber} has critical defects still open: ${list}. Close them first.`,
      );
    }
    await machine.update({ status: 'in_service' }, { transaction });
    await audit(access, 'machine.clear_tag_out', 'machine', machine.id, { note }, transaction);
    return machine;
  });
}

export interface DefectListRow {
  id: string;
  total: string;
}

/** The shop's defect list (or one machine's): worst first, then newest; operators see their machines'. */
export async function listDefects(access: OrgAccess, query: DefectListQuery) {
  const where = ['d.organization_id = :org'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    user: access.userId,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.status === 'active') where.push("d.status IN ('open','in_repair')");
  else if (query.status !== 'all') {
    where.push('d.status = :status');
    replacements.status = query.status;
  }
  if (query.severity) {
    where.push('d.severity = :severity');
    replacements.severity = query.severity;
  }
  if (query.machineId) {
    where.push('d.machine_id = :machineId');
    replacements.machineId = query.machineId;
  }
  if (query.assignedTo === 'none') where.push('d.assigned_to IS NULL');
  else if (query.assignedTo) {
    where.push('d.assigned_to = :assignedTo');
    replacements.assignedTo = query.assignedTo === 'me' ? access.userId : query.assignedTo;
  }
  if (hasRole(access, 'operator')) {
    where.push(`(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = d.organization_id AND o.machine_id = d.machine_id)
      OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = d.organization_id AND o.machine_id = d.machine_id AND o.user_id = :user))`);
  }
  const rows = await sequelize.query<DefectListRow>(
    `SELECT d.id, count(*) OVER () AS total FROM defects d
     WHERE ${where.join(' AND ')}
     ORDER BY CASE d.status WHEN 'fixed' THEN 1 ELSE 0 END,
       CASE d.severity WHEN 'critical' THEN 0 WHEN 'major' THEN 1 ELSE 2 END,
       d.last_reported_at DESC, d.id
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const defects = await Defect.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: rows.map((r) => r.id) } },
  });
  const byId = new Map(defects.map((d) => [d.id, d]));
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    defects: rows.map((r) => byId.get(r.id)!),
  };
}

/** Active defects (open or in repair) per severity, for the list's counters. */
export async function activeDefectCounts(access: OrgAccess, machineId?: string) {
  const rows = await sequelize.query<{ severity: DefectSeverity; n: number }>(
    `SELECT d.severity, count(*)::int AS n FROM defects d
     WHERE d.organization_id = :org AND d.status IN ('open','in_repair')
       ${machineId ? 'AND d.machine_id = :machineId' : ''}
       ${
         hasRole(access, 'operator')
           ? `AND (NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = d.organization_id AND o.machine_id = d.machine_id)
                OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = d.organization_id AND o.machine_id = d.machine_id AND o.user_id = :user))`
           : ''
       }
     GROUP BY d.severity`,
    {
      replacements: {
        org: access.organization.id,
        user: access.userId,
        machineId: machineId ?? null,
      },
      type: QueryTypes.SELECT,
    },
  );
  const counts = { critical: 0, major: 0, minor: 0 };
  for (const r of rows) counts[r.severity] = r.n;
  return counts;
}
