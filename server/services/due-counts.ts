// The due list's counters, its total and the fleet's size in one statement. The counters count
// tasks per status across the whole fleet (the category and machine filters apply; the horizon
// and status do not), so "OK" counts every task that is fine; the total is the list's own length
// (every filter); the fleet's size counts the machines (not sold) the caller sees, whatever the
// filters, so 0 tells an empty farm from a quiet one.
// Daily care and sold machines are left out as on the list (fleetWhere), so the counters read only
// the due points' (organization, status) index however large the fleet (migration 0025).
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { DueStatus } from '../../shared/domain/types';
import { fleetWhere, HORIZON_RULE, visibleToOperator, type DueFilterFlags } from './due-rows';

/** The SQL of the counters, total and fleet size (replacements as the list's: :org, :user …). */
export function dueCountsSql(filters: DueFilterFlags) {
  const fleet = fleetWhere(filters);
  const listed = [
    ...(filters.horizon ? [HORIZON_RULE] : []),
    ...(filters.status ? ['d.status = :status'] : []),
  ];
  return `WITH c AS (
      SELECT d.status, count(*)::int AS n${listed.length ? `, count(*) FILTER (WHERE ${listed.join(' AND ')})` : ', count(*)'}::int AS listed
      FROM task_due_points d WHERE ${fleet.join(' AND ')} GROUP BY d.status)
    SELECT coalesce((SELECT jsonb_object_agg(status, n) FROM c), '{}'::jsonb) AS counts,
      (SELECT coalesce(sum(listed), 0)::int FROM c) AS total,
      (SELECT count(*)::int FROM machines m WHERE m.organization_id = :org AND m.status <> 'sold'
        ${filters.operator ? `AND ${visibleToOperator()}` : ''}) AS machines`;
}

export type DueCounts = Record<DueStatus, number>;

/** The counters, total and fleet size for these filters and replacements. */
export async function dueCounts(
  filters: DueFilterFlags,
  replacements: Record<string, unknown>,
): Promise<{ counts: DueCounts; total: number; machines: number }> {
  const [row] = await sequelize.query<{
    counts: Partial<DueCounts>;
    total: number;
    machines: number;
  }>(dueCountsSql(filters), { replacements, type: QueryTypes.SELECT });
  return {
    counts: { overdue: 0, due_soon: 0, history_unknown: 0, ok: 0, no_forecast: 0, ...row.counts },
    total: row.total,
    machines: row.machines,
  };
}
