import type { Migration } from '../migrator';

// The due list at scale (issue 12). Measured on a farm of 5,000 machines (50,000 due points):
//  - the list's first page sorted every task inside the horizon to keep 25; an index in the
//    list's own order (overdue first, history unknown next, then the date each falls due) lets
//    the page read its 25 rows and stop;
//  - the counters joined every due point to its task and machine only to leave out daily care and
//    sold machines: the few such rows get partial indexes, so the counters (and the dealer's board,
//    farm by farm) read the due points' (organization, status) index and look past those few;
//  - whether a farm's due points are today's read every machine and its forecast: an index on
//    the forecasts' computed date answers from a handful of index pages.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE INDEX task_due_points_list_idx ON task_due_points (organization_id,
      (status = 'overdue') DESC, (status = 'history_unknown') DESC, sort_date, status_rank, task_id);
    CREATE INDEX task_due_points_status_idx ON task_due_points (organization_id, status)
      INCLUDE (sort_date, status_rank, task_id, machine_id);
    CREATE INDEX service_tasks_daily_care_idx ON service_tasks (organization_id, id) WHERE daily_care;
    CREATE INDEX machines_sold_idx ON machines (organization_id, id) WHERE status = 'sold';
    CREATE INDEX machine_forecasts_computed_idx ON machine_forecasts (organization_id, computed_on);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX machine_forecasts_computed_idx;
    DROP INDEX machines_sold_idx;
    DROP INDEX service_tasks_daily_care_idx;
    DROP INDEX task_due_points_status_idx;
    DROP INDEX task_due_points_list_idx;
  `);
};
