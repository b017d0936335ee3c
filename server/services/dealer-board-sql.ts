// The SQL of the dealer's board (also timed bare by the benchmark): every due row of the dealer's
// active customers in one statement, each farm inside its own horizon by the farm due list's rule.
// The customers come as arrays in step — :farmIds, :untils (the farm's local today + the horizon)
// and :ranks (the farm's place in the customer list, by name as the client sorts names) — taken
// from the dealer's active links just read. Other replacements as the flags say: :category,
// :status, :task, :limit, :offset.
import { DUE_ROW_COLUMNS, DUE_ROW_JOINS, fleetWhere, HORIZON_RULE } from './due-rows';

export interface BoardFilterFlags {
  category?: boolean;
  /** an undated status asked for (history unknown, no forecast): the farm lists give only it */
  undatedStatus?: boolean;
  task?: boolean;
}

// ICU's root collation orders names as the client's localeCompare does (case and accents after
// the letters), which the database's C collation would not.
const BY_NAME = 'COLLATE "und-x-icu"';

const CUSTOMERS = `unnest(ARRAY[:farmIds]::uuid[], ARRAY[:untils]::date[], ARRAY[:ranks]::int[]) AS h(farm_id, until, rank)`;

/** The due points of the board's customers inside their horizons, as conditions on d (and t). */
function boardWhere(flags: BoardFilterFlags & { status?: boolean }) {
  const where = [
    ...fleetWhere({ category: flags.category }, 'h.farm_id'),
    HORIZON_RULE.replace(':until', 'h.until'),
  ];
  if (flags.undatedStatus || flags.status) where.push('d.status = :status');
  // a plain substring, as typed: no LIKE wildcards to escape
  if (flags.task) where.push('strpos(lower(t.name), lower(:task)) > 0');
  return where.join(' AND ');
}

/**
 * The board's rows: overdue first, then by the date each task falls due (whatever the status;
 * the stored sort date is that date, undated last), then by status, customer, fleet number and
 * task name; `status` narrows to one status (the counts do not), `page` takes :limit rows from
 * :offset. The order is settled on the narrow columns first; only the page's rows are widened.
 */
export function boardRowsSql(flags: BoardFilterFlags & { status?: boolean; page?: boolean }) {
  const order = (
    k: Record<'overdue' | 'date' | 'rank' | 'customer' | 'fleet' | 'task' | 'id', string>,
  ) =>
    `${k.overdue} DESC, ${k.date} ASC NULLS LAST, ${k.rank}, ${k.customer},
        ${k.fleet} ${BY_NAME}, ${k.task} ${BY_NAME}, ${k.id}`;
  return `WITH listed AS (
      SELECT d.task_id, d.status = 'overdue' AS overdue, d.sort_date, d.status_rank, h.rank,
        m.fleet_number AS fleet, t.name AS task
      FROM ${CUSTOMERS}
      JOIN task_due_points d ON d.organization_id = h.farm_id
      JOIN service_tasks t ON t.id = d.task_id AND t.organization_id IS NOT DISTINCT FROM d.organization_id
      JOIN machines m ON m.id = d.machine_id AND m.organization_id IS NOT DISTINCT FROM d.organization_id
      WHERE ${boardWhere(flags)}
      ORDER BY ${order({ overdue: "(d.status = 'overdue')", date: 'd.sort_date', rank: 'd.status_rank', customer: 'h.rank', fleet: 'm.fleet_number', task: 't.name', id: 'd.task_id' })} ${flags.page ? 'LIMIT :limit OFFSET :offset' : ''})
    SELECT ${DUE_ROW_COLUMNS}, d.organization_id AS customer_id
    FROM listed JOIN task_due_points d ON d.task_id = listed.task_id
    ${DUE_ROW_JOINS}
    ORDER BY ${order({ overdue: 'listed.overdue', date: 'listed.sort_date', rank: 'listed.status_rank', customer: 'listed.rank', fleet: 'listed.fleet', task: 'listed.task', id: 'listed.task_id' })}`;
}

/** Rows per status of the same filters (the status itself aside): the board's counts and total. */
export const boardCountsSql = (flags: BoardFilterFlags) =>
  `SELECT d.status, count(*)::int AS n
    FROM ${CUSTOMERS}
    JOIN task_due_points d ON d.organization_id = h.farm_id
    ${flags.task ? 'JOIN service_tasks t ON t.id = d.task_id AND t.organization_id IS NOT DISTINCT FROM d.organization_id' : ''}
    WHERE ${boardWhere(flags)} GROUP BY d.status`;
