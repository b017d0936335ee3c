import { Op, QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { notFound } from '../errors';
import { Defect, Machine, Walkaround } from '../models';
import type { WalkaroundListQuery } from '../../shared/schemas/walkarounds';
import type { OrgAccess } from '../policies/access';
import { hasRole } from '../policies/access';
import { loadMachine } from './machines';

// Reading walkarounds back: the list (paged) and one walkaround with the defects it raised.

/** One walkaround of the caller's organization on a machine they may see, with its defects; else 404. */
export async function loadWalkaround(access: OrgAccess, walkaroundId: string) {
  const walkaround = await Walkaround.findOne({
    where: { id: walkaroundId, organizationId: access.organization.id },
  });
  if (!walkaround) throw notFound('Walkaround');
  const { machine } = await loadMachine(access, walkaround.machineId).catch(() => {
    throw notFound('Walkaround');
  });
  const defects = await Defect.findAll({
    where: { organizationId: access.organization.id, walkaroundId: walkaround.id },
    order: [['createdAt', 'ASC']],
  });
  return { walkaround, machine, defects };
}

/** Walkarounds, newest first, with their machines; operators see those of the machines they may see. */
export async function listWalkarounds(access: OrgAccess, query: WalkaroundListQuery) {
  const where = ['w.organization_id = :org'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    user: access.userId,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.machineId) {
    where.push('w.machine_id = :machineId');
    replacements.machineId = query.machineId;
  }
  if (query.result) {
    where.push('w.result = :result');
    replacements.result = query.result;
  }
  if (hasRole(access, 'operator')) {
    where.push(`(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = w.organization_id AND o.machine_id = w.machine_id)
      OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = w.organization_id AND o.machine_id = w.machine_id AND o.user_id = :user))`);
  }
  const rows = await sequelize.query<{ id: string; total: string }>(
    `SELECT w.id, count(*) OVER () AS total FROM walkarounds w
     WHERE ${where.join(' AND ')}
     ORDER BY w.performed_at DESC, w.id
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const found = await Walkaround.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: rows.map((r) => r.id) } },
  });
  const byId = new Map(found.map((w) => [w.id, w]));
  const walkarounds = rows.map((r) => byId.get(r.id)!);
  const machines = await Machine.findAll({
    where: {
      organizationId: access.organization.id,
      id: { [Op.in]: [...new Set(walkarounds.map((w) => w.machineId))] },
    },
  });
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    walkarounds,
    machineOf: new Map(machines.map((m) => [m.id, m])),
  };
}
