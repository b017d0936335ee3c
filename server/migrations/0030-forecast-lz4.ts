import type { Migration } from '../migrator';

// The daily summary (about 30 kB a meter for two years) and the usage of machine_forecasts are
// rewritten by every reading; lz4 compresses and decompresses them several times faster than
// PostgreSQL's default pglz, which is most of what a telematics snapshot of 500 machines spends
// writing them (issue 13, measured with EXPLAIN ANALYZE). Values already stored are recompressed
// as they are next written. A server built without lz4 keeps pglz (the statement is skipped).
const setCompression = (method: 'lz4' | 'pglz') => `
  DO $$ BEGIN
    ALTER TABLE machine_forecasts
      ALTER COLUMN daily SET COMPRESSION ${method},
      ALTER COLUMN usage SET COMPRESSION ${method};
  EXCEPTION WHEN feature_not_supported OR invalid_parameter_value THEN
    RAISE NOTICE 'machine_forecasts keeps its compression: %', SQLERRM;
  END $$;`;

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(setCompression('lz4'));
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(setCompression('pglz'));
};
