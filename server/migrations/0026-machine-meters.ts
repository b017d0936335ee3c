import type { Migration } from '../migrator';

// Several meters per machine (issue 13): a combine's engine and separator hours, a tractor's PTO
// hours, a baler's bale counter. Each machine gets one primary meter from its meter unit, and
// every reading, meter replacement, stored summary and service task is bound to it, so no
// reading is lost. machines.meter_unit stays: the primary meter's unit, which every screen and
// the due list already show.
//
// The database keeps "every machine has exactly one primary meter" for every writer (the API,
// the CSV imports' COPY, the demo, the benchmarks' data sets): a machine's insert adds its
// primary meter, a change of its meter unit follows onto the primary meter, and a row written
// without a meter id (reading, replacement, summary, task) is bound to the primary meter — the
// backward-compatible meaning of "no meter given". The BEFORE triggers run only when meter_id
// is missing (WHEN), so a write that names its meter pays nothing.
//
// A meter's (id, machine_id) is the target of each foreign key, so a row can never name a meter
// of another machine. The kinds and units are written out here, not imported, as a migration
// never changes once it has landed.
const KIND_UNITS: [string, string][] = [
  ['engine_hours', 'h'],
  ['separator_hours', 'h'],
  ['pto_hours', 'h'],
  ['bales', 'bales'],
  ['km', 'km'],
  ['miles', 'mi'],
  ['hectares', 'ha'],
  ['acres', 'acres'],
];
const PRIMARY_KIND: [string, string][] = [
  ['h', 'engine_hours'],
  ['km', 'km'],
  ['mi', 'miles'],
  ['bales', 'bales'],
  ['ha', 'hectares'],
  ['acres', 'acres'],
];
const list = (values: string[]) => values.map((v) => `'${v}'`).join(', ');
const unitOfKind = `CASE kind ${KIND_UNITS.map(([k, u]) => `WHEN '${k}' THEN '${u}'`).join(' ')} END`;
const kindOfUnit = (unit: string) =>
  `CASE ${unit} ${PRIMARY_KIND.map(([u, k]) => `WHEN '${u}' THEN '${k}'`).join(' ')} END`;

const BOUND_TABLES = ['meter_readings', 'meter_replacements', 'service_tasks', 'machine_forecasts'];

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE machine_meters (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN (${list(KIND_UNITS.map(([k]) => k))})),
      unit text NOT NULL,
      label text NOT NULL DEFAULT '' CHECK (length(label) <= 60),
      is_primary boolean NOT NULL DEFAULT false,
      position integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT machine_meters_unit_check CHECK (unit = ${unitOfKind}),
      CONSTRAINT machine_meters_machine_key UNIQUE (id, machine_id)
    );
    CREATE UNIQUE INDEX machine_meters_primary_key ON machine_meters (machine_id) WHERE is_primary;
    CREATE UNIQUE INDEX machine_meters_name_key ON machine_meters (machine_id, kind, lower(label));
    CREATE INDEX machine_meters_org_idx ON machine_meters (organization_id, machine_id, position);

    INSERT INTO machine_meters (organization_id, machine_id, kind, unit, is_primary, position, created_at)
    SELECT organization_id, id, ${kindOfUnit('meter_unit')}, meter_unit, true, 0, created_at
    FROM machines;

    CREATE FUNCTION machine_primary_meter_id() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      SELECT id INTO NEW.meter_id FROM machine_meters
        WHERE machine_id = NEW.machine_id AND is_primary;
      RETURN NEW;
    END $$;
    CREATE FUNCTION machine_add_primary_meter() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO machine_meters (organization_id, machine_id, kind, unit, is_primary)
      VALUES (NEW.organization_id, NEW.id, ${kindOfUnit('NEW.meter_unit')}, NEW.meter_unit, true);
      RETURN NULL;
    END $$;
    CREATE FUNCTION machine_follow_meter_unit() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE machine_meters SET kind = ${kindOfUnit('NEW.meter_unit')}, unit = NEW.meter_unit
        WHERE machine_id = NEW.id AND is_primary AND unit <> NEW.meter_unit;
      RETURN NULL;
    END $$;
    CREATE TRIGGER machines_primary_meter AFTER INSERT ON machines
      FOR EACH ROW EXECUTE FUNCTION machine_add_primary_meter();
    CREATE TRIGGER machines_meter_unit AFTER UPDATE OF meter_unit ON machines
      FOR EACH ROW WHEN (OLD.meter_unit IS DISTINCT FROM NEW.meter_unit)
      EXECUTE FUNCTION machine_follow_meter_unit();
  `);

  for (const table of BOUND_TABLES) {
    const onDelete = table === 'machine_forecasts' ? 'ON DELETE CASCADE' : '';
    await qi.sequelize.query(`
      ALTER TABLE ${table} ADD COLUMN meter_id uuid;
      UPDATE ${table} t SET meter_id = mm.id FROM machine_meters mm
        WHERE mm.machine_id = t.machine_id AND mm.is_primary;
      ALTER TABLE ${table} ALTER COLUMN meter_id SET NOT NULL,
        ADD CONSTRAINT ${table}_meter_fkey FOREIGN KEY (meter_id, machine_id)
          REFERENCES machine_meters (id, machine_id) ${onDelete};
      CREATE TRIGGER ${table}_primary_meter BEFORE INSERT ON ${table}
        FOR EACH ROW WHEN (NEW.meter_id IS NULL) EXECUTE FUNCTION machine_primary_meter_id();
    `);
  }

  await qi.sequelize.query(`
    -- a reading is one meter's: two meters may read the same value at the same time
    DROP INDEX meter_readings_identity_key;
    CREATE UNIQUE INDEX meter_readings_identity_key
      ON meter_readings (organization_id, meter_id, taken_at, value);
    DROP INDEX meter_replacements_machine_idx;
    CREATE INDEX meter_replacements_meter_idx
      ON meter_replacements (organization_id, meter_id, replaced_at);
    -- a counter reset (a bale counter zeroed) is recorded like a replacement of the same meter
    ALTER TABLE meter_replacements ADD COLUMN kind text NOT NULL DEFAULT 'replacement'
      CHECK (kind IN ('replacement', 'reset'));
    CREATE INDEX service_tasks_meter_idx ON service_tasks (meter_id);
    -- the stored summary is per meter
    ALTER TABLE machine_forecasts DROP CONSTRAINT machine_forecasts_pkey,
      ADD PRIMARY KEY (meter_id);
    CREATE INDEX machine_forecasts_machine_idx ON machine_forecasts (machine_id);
  `);
};

// Going down keeps the primary meters' rows only: it fails while another meter has readings,
// replacements or tasks (remove those meters first); their empty summaries are dropped.
export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DO $$
    BEGIN
      IF EXISTS (SELECT 1 FROM machine_meters mm WHERE NOT mm.is_primary AND (
           EXISTS (SELECT 1 FROM meter_readings r WHERE r.meter_id = mm.id)
        OR EXISTS (SELECT 1 FROM meter_replacements r WHERE r.meter_id = mm.id)
        OR EXISTS (SELECT 1 FROM service_tasks t WHERE t.meter_id = mm.id))) THEN
        RAISE EXCEPTION 'machines have meters beside the primary one with readings or tasks';
      END IF;
    END $$;
    DELETE FROM machine_forecasts f USING machine_meters mm
      WHERE mm.id = f.meter_id AND NOT mm.is_primary;
    ALTER TABLE machine_forecasts DROP CONSTRAINT machine_forecasts_pkey,
      ADD PRIMARY KEY (machine_id);
    DROP INDEX machine_forecasts_machine_idx;
    DROP INDEX service_tasks_meter_idx;
    ALTER TABLE meter_replacements DROP COLUMN kind;
    DROP INDEX meter_replacements_meter_idx;
    CREATE INDEX meter_replacements_machine_idx
      ON meter_replacements (organization_id, machine_id, replaced_at);
    DROP INDEX meter_readings_identity_key;
    CREATE UNIQUE INDEX meter_readings_identity_key
      ON meter_readings (organization_id, machine_id, taken_at, value);
  `);
  for (const table of BOUND_TABLES) {
    await qi.sequelize.query(`
      DROP TRIGGER ${table}_primary_meter ON ${table};
      ALTER TABLE ${table} DROP COLUMN meter_id;
    `);
  }
  await qi.sequelize.query(`
    DROP TRIGGER machines_meter_unit ON machines;
    DROP TRIGGER machines_primary_meter ON machines;
    DROP FUNCTION machine_follow_meter_unit();
    DROP FUNCTION machine_add_primary_meter();
    DROP FUNCTION machine_primary_meter_id();
    DROP TABLE machine_meters;
  `);
};
