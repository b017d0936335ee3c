import type { Migration } from '../migrator';

// Machines, meter readings and replacements, service tasks, schedule templates and the
// per-machine forecast summary. Every tenant row carries organization_id (the distribution key).
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE machines (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      fleet_number text NOT NULL,
      name text NOT NULL,
      category text NOT NULL CHECK (category IN ('tractor','combine','sprayer','baler','loader','mower','truck','implement','other')),
      make text NOT NULL DEFAULT '',
      model text NOT NULL DEFAULT '',
      serial_number text NOT NULL DEFAULT '',
      year integer,
      purchase_price numeric(12,2),
      list_price numeric(12,2),
      meter_unit text NOT NULL DEFAULT 'h' CHECK (meter_unit IN ('h','km','bales','ha','acres')),
      status text NOT NULL DEFAULT 'in_service' CHECK (status IN ('in_service','tagged_out','sold')),
      season_months integer[] NOT NULL DEFAULT '{}',
      photo_key text,
      notes text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX machines_fleet_number_key ON machines (organization_id, lower(fleet_number));
    CREATE INDEX machines_org_idx ON machines (organization_id, category, status);
    CREATE TABLE machine_operators (
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (machine_id, user_id)
    );
    CREATE INDEX machine_operators_org_user_idx ON machine_operators (organization_id, user_id);
    CREATE TABLE meter_replacements (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      replaced_at timestamptz NOT NULL,
      old_final_value numeric(14,2) NOT NULL,
      new_start_value numeric(14,2) NOT NULL,
      note text NOT NULL DEFAULT '',
      entered_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX meter_replacements_machine_idx ON meter_replacements (organization_id, machine_id, replaced_at);
    CREATE TABLE meter_readings (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      value numeric(14,2) NOT NULL,
      lifetime_value numeric(14,2) NOT NULL,
      taken_at timestamptz NOT NULL,
      source text NOT NULL DEFAULT 'manual' CHECK (source IN ('manual','walkaround','import','service','telematics')),
      entered_by uuid REFERENCES users(id) ON DELETE SET NULL,
      import_key text,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX meter_readings_identity_key ON meter_readings (organization_id, machine_id, taken_at, value);
    CREATE INDEX meter_readings_machine_idx ON meter_readings (organization_id, machine_id, taken_at);
    CREATE TABLE schedule_templates (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      category text NOT NULL,
      name text NOT NULL,
      description text NOT NULL DEFAULT '',
      tasks jsonb NOT NULL DEFAULT '[]'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX schedule_templates_org_idx ON schedule_templates (organization_id, category);
    CREATE TABLE service_tasks (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      name text NOT NULL,
      interval_meter numeric(12,2),
      interval_days integer,
      first_service_meter numeric(12,2),
      warn_meter numeric(12,2),
      warn_days integer,
      parts jsonb NOT NULL DEFAULT '[]'::jsonb,
      fluids jsonb NOT NULL DEFAULT '[]'::jsonb,
      labour_hours numeric(6,2),
      instructions text NOT NULL DEFAULT '',
      safety_notes text NOT NULL DEFAULT '',
      hazards text[] NOT NULL DEFAULT '{}',
      last_done_meter numeric(14,2),
      last_done_on date,
      position integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (interval_meter IS NOT NULL OR interval_days IS NOT NULL)
    );
    CREATE INDEX service_tasks_machine_idx ON service_tasks (organization_id, machine_id, position);
    CREATE TABLE machine_forecasts (
      machine_id uuid PRIMARY KEY REFERENCES machines(id) ON DELETE CASCADE,
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      daily jsonb NOT NULL DEFAULT '[]'::jsonb,
      reading_count integer NOT NULL DEFAULT 0,
      last_value numeric(14,2),
      last_taken_at timestamptz,
      first_taken_at timestamptz,
      usage jsonb,
      computed_on date,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX machine_forecasts_org_idx ON machine_forecasts (organization_id);
    CREATE TABLE task_due_points (
      task_id uuid PRIMARY KEY REFERENCES service_tasks(id) ON DELETE CASCADE,
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      status text NOT NULL,
      sort_date date,
      due jsonb NOT NULL,
      computed_on date NOT NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX task_due_points_org_idx ON task_due_points (organization_id, sort_date);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE task_due_points, machine_forecasts, service_tasks, schedule_templates,
      meter_readings, meter_replacements, machine_operators, machines;
  `);
};
