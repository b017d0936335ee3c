import type { Migration } from '../migrator';

// Restricted use (issue 11): a machine in service may be restricted — "Field only, no road: left
// flasher out" — with the reason shown to whoever picks it for a walkaround. Three columns on
// machines, all empty or all set; the history of setting and lifting is in audit_events
// ('machine.restrict', 'machine.lift_restriction'). The reason's bounds match the API's (3–300).
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE machines
      ADD COLUMN restriction_reason text
        CONSTRAINT machines_restriction_reason_length
        CHECK (char_length(restriction_reason) BETWEEN 3 AND 300),
      ADD COLUMN restricted_at timestamptz,
      ADD COLUMN restricted_by uuid REFERENCES users(id) ON DELETE SET NULL,
      ADD CONSTRAINT machines_restriction_complete
        CHECK ((restriction_reason IS NULL) = (restricted_at IS NULL));
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE machines
      DROP CONSTRAINT machines_restriction_complete,
      DROP COLUMN restricted_by,
      DROP COLUMN restricted_at,
      DROP COLUMN restriction_reason;
  `);
};
