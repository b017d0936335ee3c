import type { Migration } from '../migrator';

// Organization API keys for machine data and the equipment id a telematics feed knows a machine
// by (issue 13, readings from the machine).
//
// A key is `hs_<prefix>_<secret>`: the prefix (8 characters, shown to people so they can tell
// keys apart) is stored as it is, the secret only as its SHA-256. A fast hash is enough here — a
// password needs a slow one (bcrypt) because people pick guessable ones, but the secret is 32
// random bytes (256 bits) from the operating system's generator, so a stolen hash cannot be
// guessed back by trying inputs, however fast each try; a fast hash also keeps the check cheap
// on every telematics post. `scopes` allows only 'readings:write' for now. A revoked key keeps
// its row (the readings it brought in still name it) with `revoked_at` set.
//
// `machines.telematics_id` is the id a feed sends for a machine (an ISO 15143-3 EquipmentID, or
// what a J1939 logger calls it): optional, unique per organization, compared as typed.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE api_keys (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      name text NOT NULL CHECK (char_length(name) BETWEEN 1 AND 80),
      prefix text NOT NULL UNIQUE CHECK (prefix ~ '^[a-z0-9]{8}$'),
      secret_hash bytea NOT NULL CHECK (octet_length(secret_hash) = 32),
      scopes text[] NOT NULL CHECK (scopes <@ ARRAY['readings:write']::text[] AND cardinality(scopes) > 0),
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      last_used_at timestamptz,
      revoked_at timestamptz
    );
    CREATE INDEX api_keys_organization_idx ON api_keys (organization_id, created_at);
    ALTER TABLE machines
      ADD COLUMN telematics_id text
        CONSTRAINT machines_telematics_id_length CHECK (char_length(telematics_id) BETWEEN 1 AND 80);
    CREATE UNIQUE INDEX machines_telematics_id_key ON machines (organization_id, telematics_id)
      WHERE telematics_id IS NOT NULL;
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX machines_telematics_id_key;
    ALTER TABLE machines DROP COLUMN telematics_id;
    DROP TABLE api_keys;
  `);
};
