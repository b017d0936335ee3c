import type { Migration } from '../migrator';

// Season plans (issue 17): what a manager plans for a machine's season — meter units, or an area
// at a work rate — kept on the machine by season year ({"2027": {"value": 400}}), so that every
// forecast write, which has the machine row already, has its plan without another read.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE machines
      ADD COLUMN season_plans jsonb NOT NULL DEFAULT '{}'::jsonb,
      ADD CONSTRAINT machines_season_plans_object CHECK (jsonb_typeof(season_plans) = 'object');
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE machines DROP COLUMN season_plans;`);
};
