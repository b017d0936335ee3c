import type { Migration } from '../migrator';

// Dealer links (a farm grants a dealer `view` or `service` access) and service bookings a dealer
// proposes to a farm. Both carry the farm's organization so the tenant filter stays first.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE dealer_links (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      dealer_organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      -- null while a dealer's request waits for a farm manager to pick the farm
      farm_organization_id uuid REFERENCES organizations(id) ON DELETE CASCADE,
      access text NOT NULL DEFAULT 'view' CHECK (access IN ('view','service')),
      status text NOT NULL CHECK (status IN ('pending','active','revoked')),
      -- 'dealer': the dealer asked by e-mail; 'farm': the farm manager granted it
      initiated_by text NOT NULL CHECK (initiated_by IN ('dealer','farm')),
      invited_by uuid REFERENCES users(id) ON DELETE SET NULL,
      invited_email text NOT NULL DEFAULT '',
      message text NOT NULL DEFAULT '',
      token_hash text UNIQUE,
      expires_at timestamptz,
      accepted_by uuid REFERENCES users(id) ON DELETE SET NULL,
      accepted_at timestamptz,
      revoked_by uuid REFERENCES users(id) ON DELETE SET NULL,
      revoked_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (status <> 'active' OR farm_organization_id IS NOT NULL)
    );
    -- one live link per dealer and farm; a revoked one stays as history
    CREATE UNIQUE INDEX dealer_links_live_key ON dealer_links (farm_organization_id, dealer_organization_id)
      WHERE status = 'active';
    CREATE INDEX dealer_links_dealer_idx ON dealer_links (dealer_organization_id, status);

    CREATE TABLE service_bookings (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      dealer_organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      proposed_by uuid REFERENCES users(id) ON DELETE SET NULL,
      proposed_for date NOT NULL,
      -- [{ machineId, fleetNumber, machineName, tasks: [{ taskId, name }], serviceRecordId }]:
      -- names kept so the proposal stays readable; serviceRecordId set when the farm accepts
      items jsonb NOT NULL DEFAULT '[]'::jsonb,
      note text NOT NULL DEFAULT '',
      status text NOT NULL DEFAULT 'proposed'
        CHECK (status IN ('proposed','accepted','declined','cancelled')),
      response_note text NOT NULL DEFAULT '',
      decided_by uuid REFERENCES users(id) ON DELETE SET NULL,
      decided_at timestamptz,
      service_record_ids uuid[] NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX service_bookings_farm_idx ON service_bookings (organization_id, status, proposed_for);
    CREATE INDEX service_bookings_dealer_idx ON service_bookings (dealer_organization_id, status, proposed_for);
    CREATE INDEX audit_events_dealer_idx ON audit_events (organization_id, (changes->>'dealerOrganizationId'), created_at DESC)
      WHERE changes ? 'dealerOrganizationId';
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX IF EXISTS audit_events_dealer_idx;
    DROP TABLE service_bookings, dealer_links;
  `);
};
