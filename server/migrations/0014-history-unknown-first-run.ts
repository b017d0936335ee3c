import type { Migration } from '../migrator';

// A task added to a machine that came with hours is "history unknown" until someone gives its
// last service or a start to count from (count_from_*). The machine's first reading tells whether
// it came with hours. The due list ranks the new status after due soon and before OK. Managers can
// put away the first-run checklist of the dashboard (one row per person and farm).
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE service_tasks
      ADD COLUMN history_unknown boolean NOT NULL DEFAULT false,
      ADD COLUMN count_from_meter numeric(14,2),
      ADD COLUMN count_from_on date;
    ALTER TABLE machine_forecasts ADD COLUMN first_value numeric(14,2);
    UPDATE machine_forecasts f SET first_value = r.lifetime_value
    FROM (SELECT DISTINCT ON (machine_id) machine_id, lifetime_value FROM meter_readings
          ORDER BY machine_id, taken_at, lifetime_value) r
    WHERE r.machine_id = f.machine_id;
    DROP INDEX task_due_points_order_idx;
    ALTER TABLE task_due_points DROP COLUMN status_rank;
    ALTER TABLE task_due_points ADD COLUMN status_rank smallint GENERATED ALWAYS AS (
      CASE status WHEN 'overdue' THEN 0 WHEN 'due_soon' THEN 1 WHEN 'history_unknown' THEN 2
        WHEN 'ok' THEN 3 ELSE 4 END) STORED;
    CREATE INDEX task_due_points_order_idx ON task_due_points (organization_id, status_rank, sort_date, task_id);
    CREATE TABLE first_run_dismissals (
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      dismissed_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (organization_id, user_id)
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE first_run_dismissals;
    DROP INDEX task_due_points_order_idx;
    ALTER TABLE task_due_points DROP COLUMN status_rank;
    ALTER TABLE task_due_points ADD COLUMN status_rank smallint GENERATED ALWAYS AS (
      CASE status WHEN 'overdue' THEN 0 WHEN 'due_soon' THEN 1 WHEN 'ok' THEN 2 ELSE 3 END) STORED;
    CREATE INDEX task_due_points_order_idx ON task_due_points (organization_id, status_rank, sort_date, task_id);
    ALTER TABLE machine_forecasts DROP COLUMN first_value;
    ALTER TABLE service_tasks DROP COLUMN history_unknown, DROP COLUMN count_from_meter,
      DROP COLUMN count_from_on;
  `);
};
