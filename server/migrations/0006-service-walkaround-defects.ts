import type { Migration } from '../migrator';

// Service records (planned or done) with their measurements and attachments, walkaround checklist
// templates, walkarounds and their photos, and defects. Every row carries organization_id.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE service_records (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      status text NOT NULL CHECK (status IN ('planned','completed','cancelled')),
      planned_for date,
      performed_on date,
      meter_value numeric(14,2),
      meter_lifetime numeric(14,2),
      reading_id uuid REFERENCES meter_readings(id) ON DELETE SET NULL,
      -- [{ taskId, name }]: the names stay readable if a task is removed later
      tasks jsonb NOT NULL DEFAULT '[]'::jsonb,
      technician_ids uuid[] NOT NULL DEFAULT '{}',
      labour_hours numeric(8,2),
      parts jsonb NOT NULL DEFAULT '[]'::jsonb,
      fluids jsonb NOT NULL DEFAULT '[]'::jsonb,
      other_costs jsonb NOT NULL DEFAULT '[]'::jsonb,
      notes text NOT NULL DEFAULT '',
      reassembly_settings jsonb NOT NULL DEFAULT '[]'::jsonb,
      unrestored_reason text NOT NULL DEFAULT '',
      defect_ids uuid[] NOT NULL DEFAULT '{}',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      completed_by uuid REFERENCES users(id) ON DELETE SET NULL,
      completed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (status <> 'planned' OR planned_for IS NOT NULL),
      CHECK (status <> 'completed' OR (performed_on IS NOT NULL AND meter_value IS NOT NULL))
    );
    CREATE INDEX service_records_machine_idx
      ON service_records (organization_id, machine_id, (coalesce(performed_on, planned_for)) DESC);
    CREATE INDEX service_records_planned_idx
      ON service_records (organization_id, planned_for) WHERE status = 'planned';

    CREATE TABLE service_measurements (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      service_record_id uuid NOT NULL REFERENCES service_records(id) ON DELETE CASCADE,
      position integer NOT NULL DEFAULT 0,
      name text NOT NULL,
      value numeric(16,4) NOT NULL,
      unit text NOT NULL DEFAULT '',
      spec_min numeric(16,4),
      spec_max numeric(16,4),
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX service_measurements_series_idx
      ON service_measurements (organization_id, machine_id, lower(name));
    CREATE INDEX service_measurements_record_idx ON service_measurements (service_record_id, position);

    CREATE TABLE service_attachments (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      service_record_id uuid NOT NULL REFERENCES service_records(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('image','pdf')),
      content_type text NOT NULL,
      file_name text NOT NULL,
      size_bytes integer NOT NULL,
      object_key text NOT NULL,
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX service_attachments_record_idx ON service_attachments (organization_id, service_record_id);

    CREATE TABLE checklist_templates (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      category text NOT NULL,
      name text NOT NULL,
      description text NOT NULL DEFAULT '',
      items jsonb NOT NULL DEFAULT '[]'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    -- one checklist per machine category in a farm
    CREATE UNIQUE INDEX checklist_templates_category_key ON checklist_templates (organization_id, category);

    CREATE TABLE walkarounds (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      operator_id uuid REFERENCES users(id) ON DELETE SET NULL,
      client_id uuid NOT NULL,
      purpose text NOT NULL CHECK (purpose IN ('use','inspection')),
      performed_at timestamptz NOT NULL,
      meter_value numeric(14,2) NOT NULL,
      reading_id uuid REFERENCES meter_readings(id) ON DELETE SET NULL,
      template_id uuid REFERENCES checklist_templates(id) ON DELETE SET NULL,
      template_name text NOT NULL DEFAULT '',
      -- [{ itemId, label, critical, result, note, photoId }]: a copy, so later template edits keep history
      items jsonb NOT NULL DEFAULT '[]'::jsonb,
      result text NOT NULL CHECK (result IN ('ok','attention','fail')),
      tagged_out boolean NOT NULL DEFAULT false,
      notes text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now()
    );
    -- a re-sent offline submission finds the first one
    CREATE UNIQUE INDEX walkarounds_client_key ON walkarounds (organization_id, client_id);
    CREATE INDEX walkarounds_machine_idx ON walkarounds (organization_id, machine_id, performed_at DESC);

    CREATE TABLE walkaround_photos (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      walkaround_id uuid REFERENCES walkarounds(id) ON DELETE SET NULL,
      object_key text NOT NULL,
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX walkaround_photos_org_idx ON walkaround_photos (organization_id, machine_id);

    CREATE TABLE defects (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      title text NOT NULL,
      description text NOT NULL DEFAULT '',
      severity text NOT NULL CHECK (severity IN ('critical','major','minor')),
      status text NOT NULL DEFAULT 'open' CHECK (status IN ('open','in_repair','fixed')),
      walkaround_id uuid REFERENCES walkarounds(id) ON DELETE SET NULL,
      item_id text,
      photo_id uuid REFERENCES walkaround_photos(id) ON DELETE SET NULL,
      report_count integer NOT NULL DEFAULT 1,
      last_reported_at timestamptz NOT NULL DEFAULT now(),
      reported_by uuid REFERENCES users(id) ON DELETE SET NULL,
      assigned_to uuid REFERENCES users(id) ON DELETE SET NULL,
      fixed_at timestamptz,
      fixed_by uuid REFERENCES users(id) ON DELETE SET NULL,
      fixed_by_record_id uuid REFERENCES service_records(id) ON DELETE SET NULL,
      fix_note text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (status <> 'fixed' OR fixed_at IS NOT NULL)
    );
    CREATE INDEX defects_open_idx ON defects (organization_id, status, severity, created_at DESC);
    CREATE INDEX defects_machine_idx ON defects (organization_id, machine_id, status);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE defects, walkaround_photos, walkarounds, checklist_templates,
      service_attachments, service_measurements, service_records;
  `);
};
