import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { OrgAccess } from '../policies/access';
import { hasRole } from '../policies/access';
import { addDaysIso, todayIso, type DuePoint } from '../../shared/domain';
import { STALE_READING_DAYS } from '../../shared/constants';
import type { DueQuery } from '../../shared/schemas/readings';
import type { DueRow } from '../../shared/schemas/due';
import type { Usage } from '../../shared/schemas/machines';
import type { MachineRef } from '../../shared/schemas/refs';
import { ensureDuePointsCurrent } from './forecast';
import { localDaysSince, staleCutoff } from './stale-meters';

export type { DueRow } from '../../shared/schemas/due';

const visibleToOperator = `(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = m.organization_id AND o.machine_id = m.id)
  OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = m.organization_id AND o.machine_id = m.id AND o.user_id = :user))`;

interface DueFilterFlags {
  category?: boolean;
  status?: boolean;
  machineId?: boolean;
  horizon?: boolean;
  operator?: boolean;
}

/**
 * The horizon's rule, one for the list, its total and every caller: a task past its meter or its
 * date (overdue) is always in, and so is one whose last service is not known (history unknown: it
 * cannot be dated until someone answers, and it may be the most overdue of all); any other task is
 * in when the date it falls due is inside the horizon. A task with no forecast yet (too few
 * readings) cannot be placed inside or outside any horizon, so it is listed last, under its status,
 * rather than hidden: on a farm that has just brought its fleet in, that is every task.
 */
const HORIZON_RULE = `(d.status IN ('overdue','history_unknown','no_forecast') OR d.sort_date <= :until)`;

/**
 * Daily care (grease rounds, daily items) is signed off in the walkaround and shown on the
 * dashboard's daily-care board: never on the due list, so never in its digests, overdue mails,
 * calendar feed, shop week or dealer board, which a 10 h round would flood every day in harvest.
 */
const NOT_DAILY_CARE = 'NOT t.daily_care';

function dueWhere(filters: DueFilterFlags) {
  const where = ['d.organization_id = :org', "m.status <> 'sold'", NOT_DAILY_CARE];
  if (filters.category) where.push('m.category = :category');
  if (filters.status) where.push('d.status = :status');
  if (filters.machineId) where.push('d.machine_id = :machineId');
  if (filters.horizon) where.push(HORIZON_RULE);
  if (filters.operator) where.push(visibleToOperator);
  return where.join(' AND ');
}

/**
 * The SQL of the due list (also timed bare by the benchmark): overdue first, then history unknown,
 * then by the date each task falls due, whatever its status, so the order matches the heading.
 */
export function dueListSql(filters: DueFilterFlags & { page?: boolean }) {
  return `SELECT d.task_id, d.due, t.name AS task_name, t.hazards, t.labour_hours,
      m.id AS machine_id, m.fleet_number, m.name AS machine_name, m.category, m.status AS machine_status, m.meter_unit,
      m.restriction_reason IS NOT NULL AS machine_restricted,
      f.last_value, f.last_raw_value, f.last_taken_at, f.usage - 'profile' AS usage
    FROM task_due_points d
    JOIN service_tasks t ON t.id = d.task_id AND t.organization_id = d.organization_id
    JOIN machines m ON m.id = d.machine_id AND m.organization_id = d.organization_id
    LEFT JOIN machine_forecasts f ON f.machine_id = d.machine_id AND f.organization_id = d.organization_id
    WHERE ${dueWhere(filters)}
    ORDER BY (d.status = 'overdue') DESC, (d.status = 'history_unknown') DESC, d.sort_date ASC NULLS LAST, d.status_rank, d.task_id
    ${filters.page ? 'LIMIT :limit OFFSET :offset' : ''}`;
}

/** The SQL of the list's length with the same filters (for its pager). */
export const dueTotalSql = (filters: DueFilterFlags) =>
  `SELECT count(*)::int AS n FROM task_due_points d
     JOIN service_tasks t ON t.id = d.task_id AND t.organization_id = d.organization_id
     JOIN machines m ON m.id = d.machine_id AND m.organization_id = d.organization_id
     WHERE ${dueWhere(filters)}`;

interface RawDueRow {
  task_id: string;
  due: DuePoint;
  task_name: string;
  hazards: string[];
  labour_hours: number | null;
  machine_id: string;
  fleet_number: string;
  machine_name: string;
  category: MachineRef['category'];
  machine_status: MachineRef['status'];
  machine_restricted: boolean;
  meter_unit: MachineRef['meterUnit'];
  last_value: number | null;
  last_raw_value: number | null;
  last_taken_at: Date | null;
  usage: Pick<Usage, 'method' | 'rate' | 'low' | 'high'> | null;
}

/**
 * The due list of an organization: overdue first, then by the date each task falls due; the
 * counts by status describe the whole fleet (any horizon), total is the list's own length.
 */
export async function dueList(
  access: OrgAccess,
  query: DueQuery & { page?: number; pageSize?: number },
  now = new Date(),
) {
  const { organization } = access;
  await ensureDuePointsCurrent(organization.id, organization.timeZone, now);
  const asOf = todayIso(organization.timeZone, now);
  const operator = hasRole(access, 'operator');
  const flags = {
    category: !!query.category,
    status: !!query.status,
    machineId: !!query.machineId,
    horizon: !!query.horizon,
    operator,
  };
  const pageSize = query.pageSize ?? 0;
  const page = query.page ?? 1;
  const replacements = {
    org: organization.id,
    user: access.userId,
    category: query.category ?? null,
    status: query.status ?? null,
    machineId: query.machineId ?? null,
    until: query.horizon ? addDaysIso(asOf, query.horizon) : null,
    limit: pageSize,
    offset: (page - 1) * pageSize,
  };
  const raw = await sequelize.query<RawDueRow>(
    dueListSql({ ...flags, page: query.pageSize !== undefined }),
    { replacements, type: QueryTypes.SELECT },
  );
  const rows: DueRow[] = raw.map((r) => ({
    taskId: r.task_id,
    taskName: r.task_name,
    hazards: r.hazards,
    labourHours: r.labour_hours === null ? null : Number(r.labour_hours),
    machine: {
      id: r.machine_id,
      fleetNumber: r.fleet_number,
      name: r.machine_name,
      category: r.category,
      status: r.machine_status,
      restricted: r.machine_restricted,
      meterUnit: r.meter_unit,
    },
    due: r.due,
    lastReading:
      r.last_value !== null && r.last_taken_at
        ? {
            value: Number(r.last_raw_value ?? r.last_value),
            lifetimeValue: Number(r.last_value),
            takenAt: new Date(r.last_taken_at).toISOString(),
          }
        : null,
    // The due value as the meter fitted now will show it (differs after a meter replacement).
    dueOnMeter:
      r.due.dueMeter !== null && r.last_value !== null
        ? r.due.dueMeter - (Number(r.last_value) - Number(r.last_raw_value ?? r.last_value))
        : r.due.dueMeter,
    usage: r.usage && {
      method: r.usage.method,
      rate: r.usage.rate,
      low: r.usage.low,
      high: r.usage.high,
    },
  }));
  const counts = await dueCounts(access, query);
  const total =
    query.pageSize === undefined
      ? rows.length
      : (
          await sequelize.query<{ n: number }>(dueTotalSql(flags), {
            replacements,
            type: QueryTypes.SELECT,
          })
        )[0].n;
  const machines = await fleetSize(access);
  return { asOf, rows, counts, machines, total, stale: await staleMachines(access, asOf, now) };
}

/** Machines of the fleet (not sold) the caller sees: 0 tells an empty farm from a quiet one. */
async function fleetSize(access: OrgAccess) {
  const operator = hasRole(access, 'operator');
  const [row] = await sequelize.query<{ n: number }>(
    `SELECT count(*)::int AS n FROM machines m
      WHERE m.organization_id = :org AND m.status <> 'sold' ${operator ? `AND ${visibleToOperator}` : ''}`,
    { replacements: { org: access.organization.id, user: access.userId }, type: QueryTypes.SELECT },
  );
  return row.n;
}

/**
 * The SQL of the due counters: tasks per status across the whole fleet (the category and machine
 * filters apply; the horizon and status do not), so "OK" counts every task that is fine.
 */
export function dueCountsSql(filters: Pick<DueFilterFlags, 'category' | 'machineId' | 'operator'>) {
  return `SELECT d.status, count(*)::int AS n FROM task_due_points d
     JOIN service_tasks t ON t.id = d.task_id AND t.organization_id = d.organization_id
     JOIN machines m ON m.id = d.machine_id AND m.organization_id = d.organization_id
     WHERE ${dueWhere(filters)} GROUP BY d.status`;
}

/** Tasks per status of the fleet (category and machine filters only), for the count cards. */
async function dueCounts(access: OrgAccess, query: DueQuery) {
  const sql = dueCountsSql({
    category: !!query.category,
    machineId: !!query.machineId,
    operator: hasRole(access, 'operator'),
  });
  const rows = await sequelize.query<{ status: DuePoint['status']; n: number }>(sql, {
    replacements: {
      org: access.organization.id,
      user: access.userId,
      category: query.category ?? null,
      machineId: query.machineId ?? null,
    },
    type: QueryTypes.SELECT,
  });
  const counts = { overdue: 0, due_soon: 0, history_unknown: 0, ok: 0, no_forecast: 0 };
  for (const r of rows) counts[r.status] = r.n;
  return counts;
}

/** The SQL of the stale-meter list (replacements :org, :user, :month, :cutoff). */
export const staleSql = (operator: boolean) =>
  `SELECT m.id, m.fleet_number, m.name, f.last_taken_at
     FROM machines m LEFT JOIN machine_forecasts f ON f.machine_id = m.id AND f.organization_id = m.organization_id
     WHERE m.organization_id = :org AND m.status <> 'sold'
       AND (cardinality(m.season_months) = 0 OR :month = ANY(m.season_months))
       AND (f.last_taken_at IS NULL OR f.last_taken_at < :cutoff)
       ${operator ? `AND ${visibleToOperator}` : ''}
     ORDER BY f.last_taken_at ASC NULLS FIRST`;

/** Machines in season (or with no season set) with no reading for STALE_READING_DAYS local days. */
export async function staleMachines(access: OrgAccess, asOf: string, now = new Date()) {
  const month = Number(asOf.slice(5, 7));
  const rows = await sequelize.query<{
    id: string;
    fleet_number: string;
    name: string;
    last_taken_at: Date | null;
  }>(staleSql(hasRole(access, 'operator')), {
    replacements: {
      org: access.organization.id,
      user: access.userId,
      month,
      cutoff: staleCutoff(access.organization.timeZone, now, STALE_READING_DAYS),
    },
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => ({
    machine: { id: r.id, fleetNumber: r.fleet_number, name: r.name },
    lastReadingAt: r.last_taken_at ? new Date(r.last_taken_at).toISOString() : null,
    daysSince: r.last_taken_at
      ? localDaysSince(new Date(r.last_taken_at), access.organization.timeZone, now)
      : null,
  }));
}
