import type { Migration } from '../migrator';

// Sign-up and organizations of their own: the money settings and usual season of an
// organization, and the single-use links that confirm an address. A sign-up's link carries the
// name and password hash it was made with, and the account is created only when the link is
// opened, so an address nobody confirmed never has an account (and each attempt keeps its own
// password: a stranger's sign-up with someone's address cannot set theirs). An address change's
// link names the account; the new address takes effect when it is opened.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE organizations
      ADD COLUMN currency text NOT NULL DEFAULT 'USD' CHECK (currency ~ '^[A-Z]{3}$'),
      ADD COLUMN labour_rate_minor integer NOT NULL DEFAULT 0 CHECK (labour_rate_minor >= 0),
      ADD COLUMN season_months integer[] NOT NULL DEFAULT '{}';
    CREATE TABLE email_verifications (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      purpose text NOT NULL CHECK (purpose IN ('sign_up','email_change')),
      user_id uuid REFERENCES users(id) ON DELETE CASCADE,
      email text NOT NULL,
      name text,
      password_hash text,
      token_hash text NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((purpose = 'sign_up') = (user_id IS NULL)),
      CHECK (purpose <> 'sign_up' OR (name IS NOT NULL AND password_hash IS NOT NULL))
    );
    CREATE INDEX email_verifications_user_idx ON email_verifications (user_id) WHERE user_id IS NOT NULL;
    CREATE INDEX email_verifications_email_idx ON email_verifications (lower(email));
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE email_verifications;
    ALTER TABLE organizations DROP COLUMN currency, DROP COLUMN labour_rate_minor,
      DROP COLUMN season_months;
  `);
};
