import type { Migration } from '../migrator';

// The due list is read overdue-first, then by date, a page at a time: store the status rank so
// one index serves that order and a page stops early instead of sorting every task of a farm.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE task_due_points ADD COLUMN status_rank smallint GENERATED ALWAYS AS (
      CASE status WHEN 'overdue' THEN 0 WHEN 'due_soon' THEN 1 WHEN 'ok' THEN 2 ELSE 3 END) STORED;
    DROP INDEX task_due_points_org_idx;
    CREATE INDEX task_due_points_order_idx ON task_due_points (organization_id, status_rank, sort_date, task_id);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX task_due_points_order_idx;
    ALTER TABLE task_due_points DROP COLUMN status_rank;
    CREATE INDEX task_due_points_org_idx ON task_due_points (organization_id, sort_date);
  `);
};
