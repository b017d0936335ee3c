import type { Migration } from '../migrator';

// The outbox claims a message before sending it: `sending` with a lease (claimed_until), committed
// before the SMTP conversation starts, so a worker that dies mid-send leaves a claim that expires
// and is retried, never a message that is lost. A NOTIFY on commit of new rows wakes the workers.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE notifications DROP CONSTRAINT notifications_status_check;
    ALTER TABLE notifications ADD CONSTRAINT notifications_status_check
      CHECK (status IN ('queued','sending','sent','failed'));
    ALTER TABLE notifications ADD COLUMN claimed_at timestamptz, ADD COLUMN claimed_until timestamptz;
    CREATE INDEX notifications_claims_idx ON notifications (claimed_until) WHERE status = 'sending';

    -- NOTIFY is delivered when the inserting transaction commits (and not at all on rollback),
    -- once per statement that inserted rows; the payload is one of their ids.
    CREATE FUNCTION notifications_wake_workers() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE first_id uuid;
    BEGIN
      SELECT id INTO first_id FROM inserted LIMIT 1;
      IF first_id IS NOT NULL THEN
        PERFORM pg_notify('hourstone_outbox', first_id::text);
      END IF;
      RETURN NULL;
    END $$;
    CREATE TRIGGER notifications_wake_workers AFTER INSERT ON notifications
      REFERENCING NEW TABLE AS inserted
      FOR EACH STATEMENT EXECUTE FUNCTION notifications_wake_workers();
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER notifications_wake_workers ON notifications;
    DROP FUNCTION notifications_wake_workers();
    DROP INDEX notifications_claims_idx;
    UPDATE notifications SET status = 'queued' WHERE status = 'sending';
    ALTER TABLE notifications DROP COLUMN claimed_at, DROP COLUMN claimed_until;
    ALTER TABLE notifications DROP CONSTRAINT notifications_status_check;
    ALTER TABLE notifications ADD CONSTRAINT notifications_status_check
      CHECK (status IN ('queued','sent','failed'));
  `);
};
