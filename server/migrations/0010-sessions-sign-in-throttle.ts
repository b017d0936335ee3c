import type { Migration } from '../migrator';

// Server-side sessions (the signed cookie names a row here, so sign-out and a password reset end
// it at once on every API copy) and the per-account sign-in delay after repeated failures.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE sessions (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      user_agent text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      last_seen_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL,
      revoked_at timestamptz
    );
    CREATE INDEX sessions_user_idx ON sessions (user_id) WHERE revoked_at IS NULL;

    -- Keyed by the e-mail as typed (known or not, so the answers do not tell accounts apart).
    CREATE UNLOGGED TABLE sign_in_throttle (
      key text PRIMARY KEY,
      failures integer NOT NULL,
      next_attempt_at timestamptz NOT NULL,
      forget_at timestamptz NOT NULL
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE sign_in_throttle; DROP TABLE sessions;');
};
