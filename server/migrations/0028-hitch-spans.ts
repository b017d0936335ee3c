import type { Migration } from '../migrator';

// The hitch log (issue 13, implements without meters): which tractor pulled which implement, from
// when to when. An implement's hours are the tractor's engine (or PTO) hours over its spans; the
// server writes them as the implement's readings with source 'hitch' (services/hitch-readings.ts).
//
// - One implement on one tractor at a time: an exclusion constraint over the span's time range
//   (btree_gist, a contrib module shipped with Debian's PostgreSQL server package, lets a GiST
//   index compare the uuid with `=`). An open span (ended_at null) runs to infinity, so nothing can
//   start on the implement while it is still hitched. A tractor may pull several implements at
//   once (front and rear): nothing limits the tractor's side.
// - Both machines are of the span's organization: each foreign key is (machine, organization)
//   against a unique (id, organization_id) on machines, so a span can never join two farms.
// - The kinds are written out here, not imported, as a migration never changes once landed.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE EXTENSION IF NOT EXISTS btree_gist;
    ALTER TABLE machines ADD CONSTRAINT machines_id_organization_key UNIQUE (id, organization_id);
    CREATE TABLE hitch_spans (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      implement_id uuid NOT NULL,
      tractor_id uuid NOT NULL,
      meter_kind text NOT NULL DEFAULT 'engine_hours'
        CHECK (meter_kind IN ('engine_hours', 'pto_hours')),
      started_at timestamptz NOT NULL,
      ended_at timestamptz,
      entered_by uuid REFERENCES users(id) ON DELETE SET NULL,
      note text NOT NULL DEFAULT '' CHECK (char_length(note) <= 500),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT hitch_spans_implement_fkey FOREIGN KEY (implement_id, organization_id)
        REFERENCES machines (id, organization_id) ON DELETE CASCADE,
      CONSTRAINT hitch_spans_tractor_fkey FOREIGN KEY (tractor_id, organization_id)
        REFERENCES machines (id, organization_id) ON DELETE CASCADE,
      CONSTRAINT hitch_spans_not_itself CHECK (implement_id <> tractor_id),
      CONSTRAINT hitch_spans_order CHECK (ended_at IS NULL OR ended_at > started_at),
      CONSTRAINT hitch_spans_one_tractor EXCLUDE USING gist (
        implement_id WITH =, tstzrange(started_at, ended_at, '[)') WITH &&)
    );
    CREATE INDEX hitch_spans_implement_idx ON hitch_spans (organization_id, implement_id, started_at);
    CREATE INDEX hitch_spans_tractor_idx ON hitch_spans (organization_id, tractor_id, started_at);
    -- a tractor's reading post asks "does it pull anything now?": the open spans alone
    CREATE INDEX hitch_spans_open_idx ON hitch_spans (tractor_id) WHERE ended_at IS NULL;
    ALTER TABLE meter_readings DROP CONSTRAINT meter_readings_source_check,
      ADD CONSTRAINT meter_readings_source_check
        CHECK (source IN ('manual','walkaround','import','service','telematics','hitch'));
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DELETE FROM meter_readings WHERE source = 'hitch';
    ALTER TABLE meter_readings DROP CONSTRAINT meter_readings_source_check,
      ADD CONSTRAINT meter_readings_source_check
        CHECK (source IN ('manual','walkaround','import','service','telematics'));
    DROP TABLE hitch_spans;
    ALTER TABLE machines DROP CONSTRAINT machines_id_organization_key;
  `);
};
