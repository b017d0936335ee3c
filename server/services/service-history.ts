import { Op, QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { ServiceRecord, type Machine } from '../models';
import type { ServiceHistoryQuery } from '../../shared/schemas/service-records';
import type { OrgAccess } from '../policies/access';

// Reading a machine's service records: its history (paged, searchable) and its measurements over time.

const likeOf = (q: string) => `%${q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;

/** A machine's records, newest first (by the date done, or booked); q searches notes, task names and parts. */
export async function machineHistory(
  access: OrgAccess,
  machine: Machine,
  query: ServiceHistoryQuery,
) {
  const where = ['r.organization_id = :org', 'r.machine_id = :machine'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    machine: machine.id,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.status) {
    where.push('r.status = :status');
    replacements.status = query.status;
  }
  if (query.q) {
    where.push(`(r.notes ILIKE :q
      OR EXISTS (SELECT 1 FROM jsonb_array_elements(r.tasks) t WHERE t->>'name' ILIKE :q)
      OR EXISTS (SELECT 1 FROM jsonb_array_elements(r.parts) p
                 WHERE p->>'partNumber' ILIKE :q OR p->>'description' ILIKE :q))`);
    replacements.q = likeOf(query.q);
  }
  const rows = await sequelize.query<{ id: string; total: string }>(
    `SELECT r.id, count(*) OVER () AS total FROM service_records r
     WHERE ${where.join(' AND ')}
     ORDER BY coalesce(r.performed_on, r.planned_for) DESC, r.created_at DESC, r.id
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const records = await ServiceRecord.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: rows.map((r) => r.id) } },
  });
  const byId = new Map(records.map((r) => [r.id, r]));
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    records: rows.map((r) => byId.get(r.id)!),
  };
}

/** The measurement names a machine's completed records carry, for a chart's picker. */
export async function measurementNames(access: OrgAccess, machine: Machine) {
  const rows = await sequelize.query<{
    name: string;
    unit: string;
    n: number;
    last_on: string;
    last_value: number;
  }>(
    `SELECT (array_agg(m.name ORDER BY r.performed_on DESC))[1] AS name,
            (array_agg(m.unit ORDER BY r.performed_on DESC))[1] AS unit,
            count(*)::int AS n, max(r.performed_on) AS last_on,
            (array_agg(m.value ORDER BY r.performed_on DESC, r.created_at DESC))[1] AS last_value
     FROM service_measurements m
     JOIN service_records r ON r.id = m.service_record_id AND r.organization_id = m.organization_id
     WHERE m.organization_id = :org AND m.machine_id = :machine AND r.status = 'completed'
     GROUP BY lower(m.name) ORDER BY lower(m.name)`,
    {
      replacements: { org: access.organization.id, machine: machine.id },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    name: r.name,
    unit: r.unit,
    count: r.n,
    lastOn: r.last_on,
    lastValue: Number(r.last_value),
  }));
}

/** One measurement over time on a machine (completed visits, oldest first), for a chart. */
export async function measurementSeries(access: OrgAccess, machine: Machine, name: string) {
  const rows = await sequelize.query<{
    record_id: string;
    performed_on: string;
    meter_value: number | null;
    name: string;
    value: number;
    unit: string;
    spec_min: number | null;
    spec_max: number | null;
  }>(
    `SELECT r.id AS record_id, r.performed_on, r.meter_value, m.name, m.value, m.unit, m.spec_min, m.spec_max
     FROM service_measurements m
     JOIN service_records r ON r.id = m.service_record_id AND r.organization_id = m.organization_id
     WHERE m.organization_id = :org AND m.machine_id = :machine AND lower(m.name) = lower(:name)
       AND r.status = 'completed'
     ORDER BY r.performed_on, r.created_at, m.position`,
    {
      replacements: { org: access.organization.id, machine: machine.id, name },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    recordId: r.record_id,
    performedOn: r.performed_on,
    meterValue: r.meter_value === null ? null : Number(r.meter_value),
    value: Number(r.value),
    unit: r.unit,
    specMin: r.spec_min === null ? null : Number(r.spec_min),
    specMax: r.spec_max === null ? null : Number(r.spec_max),
  }));
}
