// The shop's defect list and its counters, filtered on the server; operators see their machines'.
import { Op, QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { Defect, Machine } from '../models';
import type { DefectListQuery, DefectSeverity } from '../../shared/schemas/defects';
import { hasRole, type OrgAccess } from '../policies/access';

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

/** The machines of these defects (all of one organization), by id. */
export async function machinesOfDefects(defects: Defect[]) {
  if (!defects.length) return new Map<string, Machine>();
  const machines = await Machine.findAll({
    where: {
      organizationId: defects[0].organizationId,
      id: { [Op.in]: [...new Set(defects.map((d) => d.machineId))] },
    },
  });
  return new Map(machines.map((m) => [m.id, m]));
}
