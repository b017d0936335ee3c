import { QueryTypes } from 'sequelize';
import { readDb } from '../db';
import { addDaysIso, todayIso } from '../../shared/domain';
import type { DueStatus } from '../../shared/domain/types';
import type { BoardQuery } from '../../shared/schemas/dealers';
import type { OrgAccess } from '../policies/access';
import type { DueRow } from './due-list';
import { toDueRow, type RawDueRow } from './due-rows';
import { readCurrent } from './due-freshness';
import { boardCountsSql, boardRowsSql, type BoardFilterFlags } from './dealer-board-sql';
import { activeLinks, dealerAccessFor, recordDealerReads } from './dealer-access';

const DAY_MS = 86_400_000;

export interface BoardRow extends DueRow {
  customer: { id: string; name: string; timeZone: string; access: 'view' | 'service' };
  /** whole days since the last reading (the forecast's freshness), null without readings */
  lastReadingAgeDays: number | null;
}

type BoardFilters = Pick<BoardQuery, 'horizon' | 'customerId' | 'category' | 'status' | 'task'>;

/**
 * Every due row of the dealer's active customers inside the horizon, by the rule and with the
 * figures of each farm's own due list (the due points are brought to today as that list does,
 * never recomputed otherwise), with the customer and the last reading's age. Overdue first, then
 * by the date each task falls due (whatever the status), as on the farm's due list. One
 * statement reads the rows of every customer, one counts them, and one writes a 'dealer.read'
 * to each farm's audit log. `page` cuts one page in the database; without it every row comes.
 */
export async function boardRows(
  access: OrgAccess,
  query: BoardFilters,
  path: string,
  now = new Date(),
  page?: { limit: number; offset: number },
) {
  const all = await activeLinks(access.organization.id);
  const customers = all.map((l) => ({ id: l.farm!.id, name: l.farm!.name, access: l.access }));
  const asOf = todayIso(access.organization.timeZone, now);
  const counts: Record<DueStatus, number> = {
    overdue: 0,
    due_soon: 0,
    history_unknown: 0,
    ok: 0,
    no_forecast: 0,
  };
  const links = query.customerId ? all.filter((l) => l.farm!.id === query.customerId) : all;
  if (!links.length) return { asOf, rows: [] as BoardRow[], counts, total: 0, customers };

  const farms = links.map((l) => l.farm!);
  // Undated tasks fall inside no horizon: the farm's list gives them when asked for by status.
  const undated = query.status === 'history_unknown' || query.status === 'no_forecast';
  const flags: BoardFilterFlags = {
    category: !!query.category,
    undatedStatus: undated,
    task: !!query.task,
  };
  const replacements = {
    farmIds: farms.map((f) => f.id),
    untils: farms.map((f) => addDaysIso(todayIso(f.timeZone, now), query.horizon)),
    // customers in the order activeLinks gives them (by name, as the client sorts names)
    ranks: links.map((l) => all.indexOf(l)),
    category: query.category ?? null,
    status: query.status ?? null,
    task: query.task ?? null,
    limit: page?.limit ?? null,
    offset: page?.offset ?? null,
  };
  // The rows and counts come from the read replica when there is one (DATABASE_READ_URL), so a
  // board may be a few seconds behind the farms; who is linked, the freshness check (which
  // decides writes) and the audit stay on the primary.
  const read = () =>
    Promise.all([
      readDb.query<RawDueRow & { customer_id: string }>(
        boardRowsSql({ ...flags, status: !!query.status, page: !!page }),
        { replacements, type: QueryTypes.SELECT },
      ),
      readDb.query<{ status: DueStatus; n: number }>(boardCountsSql(flags), {
        replacements,
        type: QueryTypes.SELECT,
      }),
    ]);
  // the reads, the audit of each farm read and the check that the due points are today's at once
  const [[raw, byStatus]] = await Promise.all([
    readCurrent(farms, now, read),
    recordDealerReads(
      links.map((l) => dealerAccessFor(l, l.farm!, access.userId)),
      { entityType: 'due', path },
    ),
  ]);
  for (const c of byStatus) counts[c.status] = c.n;
  const customerOf = new Map(
    links.map((l) => [
      l.farm!.id,
      { id: l.farm!.id, name: l.farm!.name, timeZone: l.farm!.timeZone, access: l.access },
    ]),
  );
  const rows: BoardRow[] = raw.map((r) => {
    const row = toDueRow(r);
    return {
      ...row,
      customer: customerOf.get(r.customer_id)!,
      lastReadingAgeDays: row.lastReading
        ? Math.max(0, Math.floor((now.getTime() - Date.parse(row.lastReading.takenAt)) / DAY_MS))
        : null,
    };
  });
  const total = query.status
    ? counts[query.status]
    : Object.values(counts).reduce((a, b) => a + b, 0);
  return { asOf, rows, counts, total, customers };
}

/** One page of the board, with the counts and the customers for the filter. */
export async function dealerBoard(access: OrgAccess, query: BoardQuery, path: string) {
  return boardRows(access, query, path, new Date(), {
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
}
