import type { Migration } from '../migrator';

// The value shown on the meter fitted now (differs from the lifetime value after a replacement),
// so screens can show a person the number they will read on the machine.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE machine_forecasts ADD COLUMN last_raw_value numeric(14,2);
    UPDATE machine_forecasts f SET last_raw_value = r.value
    FROM (SELECT DISTINCT ON (machine_id) machine_id, value FROM meter_readings
          ORDER BY machine_id, taken_at DESC, lifetime_value DESC) r
    WHERE r.machine_id = f.machine_id;
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE machine_forecasts DROP COLUMN last_raw_value');
};
