import type { Migration } from '../migrator';

// A spec sheet per machine (issue 11): capacities and fluids, filter numbers, tyre pressures,
// torques and test pressures with their conditions, as the farm copies them from the manual.
//
// Its own table, one row per machine (the machine's id is the key), not a column of `machines`:
// the fleet list and every due query read machines by the thousand and never need the sheet,
// and the sheet keeps its own `updated_at` / `updated_by`. One JSONB column per section, not
// one document: a section is read and written whole by the API (shared/schemas/spec-sheet.ts
// validates each with zod before it is stored), and a PATCH of one section leaves the other
// columns untouched, which is what the PATCH round-trip test checks column by column. The
// CHECKs keep each column's JSON type, so a stray write cannot store a list as a section.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE machine_spec_sheets (
      machine_id uuid PRIMARY KEY REFERENCES machines(id) ON DELETE CASCADE,
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      -- { engineOil: { quantity, unit: 'L'|'gal', spec }, hydraulicTransmission, frontAxle, … }
      capacities jsonb NOT NULL DEFAULT '{}'::jsonb CHECK (jsonb_typeof(capacities) = 'object'),
      -- [{ name, quantity, unit, spec }]
      extra_capacities jsonb NOT NULL DEFAULT '[]'::jsonb
        CHECK (jsonb_typeof(extra_capacities) = 'array'),
      -- { engineOil: 'part number', fuelPrimary, … }
      filters jsonb NOT NULL DEFAULT '{}'::jsonb CHECK (jsonb_typeof(filters) = 'object'),
      -- [{ name, partNumber }]
      extra_filters jsonb NOT NULL DEFAULT '[]'::jsonb CHECK (jsonb_typeof(extra_filters) = 'array'),
      -- { front: { value, unit: 'kPa'|'psi'|'bar', note }, rear }
      tyre_pressures jsonb NOT NULL DEFAULT '{}'::jsonb
        CHECK (jsonb_typeof(tyre_pressures) = 'object'),
      -- [{ name, value, unit: 'Nm'|'lbf_ft', note }]
      torques jsonb NOT NULL DEFAULT '[]'::jsonb CHECK (jsonb_typeof(torques) = 'array'),
      -- [{ name, min, max, unit, engineRpm, oilTemperature: { value, unit } | null, conditions }]
      test_pressures jsonb NOT NULL DEFAULT '[]'::jsonb
        CHECK (jsonb_typeof(test_pressures) = 'array'),
      notes text NOT NULL DEFAULT '',
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX machine_spec_sheets_org_idx ON machine_spec_sheets (organization_id);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE machine_spec_sheets;');
};
