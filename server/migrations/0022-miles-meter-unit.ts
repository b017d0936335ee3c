import type { Migration } from '../migrator';

// Miles join the meter units (issue 11): a US farm's grain truck reads its odometer in miles.
// The CHECK of machines.meter_unit (0002, named by PostgreSQL machines_meter_unit_check) is
// replaced by one that also allows 'mi'. The values are written out here, not imported, as a
// migration never changes once it has landed. Going down fails while any machine counts in
// miles: change those machines' meter unit first.
const BEFORE = ['h', 'km', 'bales', 'ha', 'acres'];
const AFTER = ['h', 'km', 'mi', 'bales', 'ha', 'acres'];

const check = (units: string[]) => `
  ALTER TABLE machines
    DROP CONSTRAINT machines_meter_unit_check,
    ADD CONSTRAINT machines_meter_unit_check
      CHECK (meter_unit IN (${units.map((u) => `'${u}'`).join(', ')}));
`;

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(check(AFTER));
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(check(BEFORE));
};
