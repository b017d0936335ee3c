import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { OrgAccess } from '../policies/access';
import { hasRole } from '../policies/access';
import {
  addDaysIso,
  isStaleMeter,
  STALE_MIN_DAYS,
  todayIso,
  unrecordedUse,
} from '../../shared/domain';
import type { DueQuery } from '../../shared/schemas/readings';
import type { DueRow } from '../../shared/schemas/due';
import { bringDuePointsCurrent, readCurrent } from './due-freshness';
import { dueCounts } from './due-counts';
import { PRIMARY_FORECAST_JOIN } from './primary-forecast';
import { localDaysSince, staleCutoff } from './stale-meters';
import {
  DUE_ORDER,
  DUE_ROW_COLUMNS,
  DUE_ROW_JOINS,
  fleetWhere,
  DIGEST_RULE,
  HORIZON_RULE,
  toDueRow,
  visibleToOperator,
  type DueFilterFlags,
  type RawDueRow,
} from './due-rows';

export type { DueRow } from '../../shared/schemas/due';

/**
 * The SQL of the due list (also timed bare by the benchmark): overdue first, then history unknown,
 * then by the date each task falls due, whatever its status, so the order matches the heading.
 * A page is cut from the due points alone, in the order of their list index (migration 0025), so
 * it reads its rows and stops; only those rows are joined to their tasks, machines and forecasts.
 */
export function dueListSql(filters: DueFilterFlags & { page?: boolean; digest?: boolean }) {
  const where = fleetWhere(filters);
  if (filters.status) where.push('d.status = :status');
  if (filters.horizon) where.push(HORIZON_RULE);
  if (filters.digest) where.push(DIGEST_RULE);
  const points = filters.page
    ? `(SELECT d.* FROM task_due_points d WHERE ${where.join(' AND ')}
        ORDER BY ${DUE_ORDER} LIMIT :limit OFFSET :offset) d`
    : 'task_due_points d';
  return `SELECT ${DUE_ROW_COLUMNS}
    FROM ${points}
    ${DUE_ROW_JOINS}
    ${filters.page ? '' : `WHERE ${where.join(' AND ')}`}
    ORDER BY ${DUE_ORDER}`;
}

/** The filters and replacements of one due-list query as the caller may see it. */
function dueQueryOf(
  access: OrgAccess,
  query: DueQuery & { page?: number; pageSize?: number },
  asOf: string,
) {
  const flags = {
    category: !!query.category,
    status: !!query.status,
    machineId: !!query.machineId,
    horizon: !!query.horizon,
    operator: hasRole(access, 'operator'),
  };
  const pageSize = query.pageSize ?? 0;
  const replacements = {
    org: access.organization.id,
    user: access.userId,
    category: query.category ?? null,
    status: query.status ?? null,
    machineId: query.machineId ?? null,
    until: query.horizon ? addDaysIso(asOf, query.horizon) : null,
    limit: pageSize,
    offset: ((query.page ?? 1) - 1) * pageSize,
  };
  return { flags, replacements };
}

/**
 * The rows of the due list alone (no counters, no stale meters), for callers that only read them.
 * `fresh`: the caller has already brought the farm's due points up to date. `digestUntil` (ISO
 * date): only the rows a digest can carry (DIGEST_RULE), not the whole fleet's.
 */
export async function dueRows(
  access: OrgAccess,
  query: DueQuery & { page?: number; pageSize?: number },
  now = new Date(),
  options: { fresh?: boolean; digestUntil?: string } = {},
): Promise<{ asOf: string; rows: DueRow[] }> {
  const { organization } = access;
  if (!options.fresh) await bringDuePointsCurrent([organization], now);
  const asOf = todayIso(organization.timeZone, now);
  const { flags, replacements } = dueQueryOf(access, query, asOf);
  const sql = dueListSql({
    ...flags,
    page: query.pageSize !== undefined,
    digest: options.digestUntil !== undefined,
  });
  const raw = await sequelize.query<RawDueRow>(sql, {
    replacements: { ...replacements, digestUntil: options.digestUntil ?? null },
    type: QueryTypes.SELECT,
  });
  return { asOf, rows: raw.map(toDueRow) };
}

/**
 * The due list of an organization: overdue first, then by the date each task falls due; the
 * counts by status describe the whole fleet (any horizon), total is the list's own length.
 * Its three reads — the page, the counters with the total and the fleet's size, the stale
 * meters — go to the database at once, beside the check that the due points are today's.
 */
export async function dueList(
  access: OrgAccess,
  query: DueQuery & { page?: number; pageSize?: number },
  now = new Date(),
) {
  const asOf = todayIso(access.organization.timeZone, now);
  const { flags, replacements } = dueQueryOf(access, query, asOf);
  const [{ rows }, { counts, total, machines }, stale] = await readCurrent(
    [access.organization],
    now,
    () =>
      Promise.all([
        dueRows(access, query, now, { fresh: true }),
        dueCounts(flags, replacements),
        staleMachines(access, asOf, now),
      ]),
  );
  return { asOf, rows, counts, machines, total, stale };
}

/**
 * The SQL of the stale-meter candidates (replacements :org, :user, :month, :cutoff): machines not
 * sold whose primary meter was last read before :cutoff (STALE_MIN_DAYS ago) or never, with its
 * pace, its tasks' shortest meter interval and whether :month is in its season.
 */
export const staleSql = (operator: boolean) =>
  `SELECT m.id, m.fleet_number, m.name, f.last_taken_at,
          CASE WHEN f.usage->>'method' IN ('trend', 'season') THEN (f.usage->>'rate')::float8 END AS rate,
          (SELECT min(t.interval_meter)::float8 FROM service_tasks t
            WHERE t.organization_id = m.organization_id AND t.meter_id = pm.id) AS shortest,
          (cardinality(m.season_months) = 0 OR :month = ANY(m.season_months)) AS in_season,
          pm.unit
     FROM machines m ${PRIMARY_FORECAST_JOIN}
     WHERE m.organization_id = :org AND m.status <> 'sold'
       AND (f.last_taken_at IS NULL OR f.last_taken_at < :cutoff)
       ${operator ? `AND ${visibleToOperator()}` : ''}
     ORDER BY f.last_taken_at ASC NULLS FIRST`;

/**
 * Machines whose meter is stale (shared/domain/staleness.ts): the use that may have gone
 * unrecorded at their current pace is 5 % of their shortest meter interval or more, or, in
 * season, no reading for 60 days; never within two days of a reading.
 */
export async function staleMachines(access: OrgAccess, asOf: string, now = new Date()) {
  const month = Number(asOf.slice(5, 7));
  const timeZone = access.organization.timeZone;
  const rows = await sequelize.query<{
    id: string;
    fleet_number: string;
    name: string;
    last_taken_at: Date | null;
    rate: number | null;
    shortest: number | null;
    in_season: boolean;
    unit: string;
  }>(staleSql(hasRole(access, 'operator')), {
    replacements: {
      org: access.organization.id,
      user: access.userId,
      month,
      cutoff: staleCutoff(timeZone, now, STALE_MIN_DAYS),
    },
    type: QueryTypes.SELECT,
  });
  return rows.flatMap((r) => {
    const daysSince = r.last_taken_at
      ? localDaysSince(new Date(r.last_taken_at), timeZone, now)
      : null;
    const input = {
      daysSince,
      ratePerDay: r.rate,
      shortestInterval: r.shortest,
      inSeason: r.in_season,
    };
    if (!isStaleMeter(input)) return [];
    return [
      {
        machine: { id: r.id, fleetNumber: r.fleet_number, name: r.name },
        lastReadingAt: r.last_taken_at ? new Date(r.last_taken_at).toISOString() : null,
        daysSince,
        unrecorded:
          daysSince === null ? null : Math.round(unrecordedUse(daysSince, r.rate) * 10) / 10,
        unit: r.unit,
      },
    ];
  });
}
