import type { Migration } from '../migrator';

// Sign-in throttling counters live in the database so any number of API copies share them.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE UNLOGGED TABLE rate_limit_hits (
      key text PRIMARY KEY,
      hits integer NOT NULL,
      reset_at timestamptz NOT NULL
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE rate_limit_hits');
};
