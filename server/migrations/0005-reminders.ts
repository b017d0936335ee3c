import type { Migration } from '../migrator';

// Reminders: each member's digest preferences, the hour a farm's digest goes out, private calendar
// feeds (one per farm and one per person, revocable), and an index for the "Sent messages" page.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE organizations ADD COLUMN digest_hour smallint NOT NULL DEFAULT 6
      CHECK (digest_hour BETWEEN 0 AND 23);
    CREATE TABLE notification_preferences (
      membership_id uuid PRIMARY KEY REFERENCES memberships(id) ON DELETE CASCADE,
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      frequency text NOT NULL CHECK (frequency IN ('daily','weekly','off')),
      weekday smallint NOT NULL DEFAULT 1 CHECK (weekday BETWEEN 1 AND 7),
      machine_ids uuid[] NOT NULL DEFAULT '{}',
      categories text[] NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX notification_preferences_org_idx ON notification_preferences (organization_id);
    CREATE TABLE calendar_feeds (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      user_id uuid REFERENCES users(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      revoked_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    -- at most one live feed per farm (user_id null) and per person in a farm
    CREATE UNIQUE INDEX calendar_feeds_live_key
      ON calendar_feeds (organization_id, coalesce(user_id, '00000000-0000-0000-0000-000000000000'::uuid))
      WHERE revoked_at IS NULL;
    CREATE INDEX notifications_org_idx ON notifications (organization_id, created_at DESC);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX notifications_org_idx;
    DROP TABLE calendar_feeds, notification_preferences;
    ALTER TABLE organizations DROP COLUMN digest_hour;
  `);
};
