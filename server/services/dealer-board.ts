import { todayIso } from '../../shared/domain';
import type { DueStatus } from '../../shared/domain/types';
import type { BoardQuery } from '../../shared/schemas/dealers';
import type { OrgAccess } from '../policies/access';
import { dueList, type DueRow } from './due-list';
import { activeLinks, dealerAccessFor, recordDealerRead } from './dealer-access';

const DAY_MS = 86_400_000;
const STATUS_RANK: Record<DueStatus, number> = {
  overdue: 0,
  due_soon: 1,
  history_unknown: 2,
  ok: 3,
  no_forecast: 4,
};

export interface BoardRow extends DueRow {
  customer: { id: string; name: string; timeZone: string; access: 'view' | 'service' };
  /** whole days since the last reading (the forecast's freshness), null without readings */
  lastReadingAgeDays: number | null;
}

/** The date a row is sorted by: when it falls due, else its projected or calendar date. */
const sortDate = (r: DueRow) =>
  r.due.effectiveDate ?? r.due.projectedDate ?? r.due.dueDate ?? '9999-12-31';

/**
 * Every due row of the dealer's active customers inside the horizon, as each farm's own due list
 * gives it (the due points are never recomputed here), with the customer and the last reading's
 * age. Overdue first, then by the date each task falls due (whatever the status), as on the farm's
 * due list. Each farm read is audited.
 */
export async function boardRows(
  access: OrgAccess,
  query: Pick<BoardQuery, 'horizon' | 'customerId' | 'category' | 'status' | 'task'>,
  path: string,
  now = new Date(),
) {
  const all = await activeLinks(access.organization.id);
  const links = query.customerId ? all.filter((l) => l.farm!.id === query.customerId) : all;
  const rows: BoardRow[] = [];
  for (const link of links) {
    const farmAccess = dealerAccessFor(link, link.farm!, access.userId);
    // Undated tasks fall inside no horizon: the farm's list gives them when asked for by status.
    const undated = query.status === 'history_unknown' || query.status === 'no_forecast';
    const { rows: due } = await dueList(
      farmAccess,
      {
        horizon: query.horizon,
        category: query.category,
        ...(undated && { status: query.status }),
      },
      now,
    );
    await recordDealerRead(farmAccess, { entityType: 'due', path });
    const customer = {
      id: link.farm!.id,
      name: link.farm!.name,
      timeZone: link.farm!.timeZone,
      access: link.access,
    };
    for (const r of due)
      rows.push({
        ...r,
        customer,
        lastReadingAgeDays: r.lastReading
          ? Math.max(0, Math.floor((now.getTime() - Date.parse(r.lastReading.takenAt)) / DAY_MS))
          : null,
      });
  }
  const task = query.task?.toLowerCase();
  const matching = task ? rows.filter((r) => r.taskName.toLowerCase().includes(task)) : rows;
  const counts: Record<DueStatus, number> = {
    overdue: 0,
    due_soon: 0,
    history_unknown: 0,
    ok: 0,
    no_forecast: 0,
  };
  for (const r of matching) counts[r.due.status]++;
  const listed = query.status ? matching.filter((r) => r.due.status === query.status) : matching;
  listed.sort(
    (a, b) =>
      Number(b.due.status === 'overdue') - Number(a.due.status === 'overdue') ||
      sortDate(a).localeCompare(sortDate(b)) ||
      STATUS_RANK[a.due.status] - STATUS_RANK[b.due.status] ||
      a.customer.name.localeCompare(b.customer.name) ||
      a.machine.fleetNumber.localeCompare(b.machine.fleetNumber) ||
      a.taskName.localeCompare(b.taskName),
  );
  return {
    asOf: todayIso(access.organization.timeZone, now),
    rows: listed,
    counts,
    customers: all.map((l) => ({ id: l.farm!.id, name: l.farm!.name, access: l.access })),
  };
}

/** One page of the board, with the counts and the customers for the filter. */
export async function dealerBoard(access: OrgAccess, query: BoardQuery, path: string) {
  const board = await boardRows(access, query, path);
  const start = (query.page - 1) * query.pageSize;
  return {
    ...board,
    total: board.rows.length,
    rows: board.rows.slice(start, start + query.pageSize),
  };
}
