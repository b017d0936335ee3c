import type { Migration } from '../migrator';

// Daily care (issue 11): grease rounds and daily items (drain the water separator, top up DEF,
// blow out the radiator screen) that the operator signs off inside the walkaround, without a
// service record. A task flag, and on each walkaround the daily care it signed off (task id, name
// and whether the task was reset), so the walkaround's history says what was done with it.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE service_tasks ADD COLUMN daily_care boolean NOT NULL DEFAULT false;
    ALTER TABLE walkarounds ADD COLUMN care_done jsonb NOT NULL DEFAULT '[]'::jsonb;
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE walkarounds DROP COLUMN care_done;
    ALTER TABLE service_tasks DROP COLUMN daily_care;
  `);
};
