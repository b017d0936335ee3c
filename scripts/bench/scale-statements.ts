// The bare SQL each timed answer of the scale part needs: the app's own statements (imported from
// the services, so baseline and app cannot drift apart), with the values a request would bind.
import { addDaysIso, todayIso } from '../../shared/domain';
import { STALE_READING_DAYS } from '../../shared/constants';
import { dueListSql, staleSql } from '../../server/services/due-list';
import { dueCountsSql } from '../../server/services/due-counts';
import { staleCutoff } from '../../server/services/stale-meters';
import { boardCountsSql, boardRowsSql } from '../../server/services/dealer-board-sql';
import { DEALER_READS_SQL } from '../../server/services/dealer-access';
import type { BareStatement } from './scale-timing';
import type { BenchFarm } from './datasets';

/**
 * The dashboard's first page (30 days, 25 rows) of a manager: the page, the counters of the whole
 * fleet with the list's total and the fleet's size, and the stale meters — what the answer carries.
 */
export function dueBareStatements(farm: BenchFarm): () => BareStatement[] {
  return () => {
    const now = new Date();
    const asOf = todayIso(farm.timeZone, now);
    const values = {
      org: farm.id,
      user: null,
      until: addDaysIso(asOf, 30),
      limit: 25,
      offset: 0,
      month: Number(asOf.slice(5, 7)),
      cutoff: staleCutoff(farm.timeZone, now, STALE_READING_DAYS),
    };
    return [
      dueListSql({ horizon: true, page: true }),
      dueCountsSql({ horizon: true }),
      staleSql(false),
    ].map((sql) => ({ sql, replacements: values }));
  };
}

const LINKS_SQL = `SELECT l.id, l.farm_organization_id, l.access, o.name, o.time_zone
  FROM dealer_links l JOIN organizations o ON o.id = l.farm_organization_id
  WHERE l.dealer_organization_id = :dealer AND l.status = 'active' AND o.kind = 'farm'`;

/**
 * The board's first page (30 days, 25 rows) across every customer: the dealer's active links,
 * the page, the counts by status, and one audit row per farm read ('dealer.read').
 */
export function boardBareStatements(
  dealerId: string,
  farms: BenchFarm[],
  path: string,
): () => BareStatement[] {
  return () => {
    const now = new Date();
    const values = {
      dealer: dealerId,
      farmIds: farms.map((f) => f.id),
      untils: farms.map((f) => addDaysIso(todayIso(f.timeZone, now), 30)),
      ranks: farms.map((_, i) => i),
      limit: 25,
      offset: 0,
    };
    return [
      { sql: LINKS_SQL, replacements: values },
      { sql: boardRowsSql({ page: true }), replacements: values },
      { sql: boardCountsSql({}), replacements: values },
      {
        sql: DEALER_READS_SQL,
        replacements: {
          farmIds: values.farmIds,
          accesses: farms.map(() => 'view'),
          actor: null,
          dealer: dealerId,
          entityType: 'due',
          path: path.split('?')[0],
        },
      },
    ];
  };
}
