import type { Migration } from '../migrator';

// Season services (issue 11): a task may fall due a set number of days before the machine's
// season starts ('before_start', the pre-season service) or after it ends ('after_end', the
// storage service), so a yearly date does not drift into harvest. Both columns are nullable and
// go together; a season task takes no day interval (its date is the season's) but may keep a
// meter interval, so the old "a meter or a day interval" rule now also lets a season stand alone.
// The 0002 table check had no name: it is found by its expression and replaced by a named one.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE service_tasks
      ADD COLUMN season_anchor text
        CONSTRAINT service_tasks_season_anchor_check
        CHECK (season_anchor IN ('before_start', 'after_end')),
      ADD COLUMN season_offset_days integer
        CONSTRAINT service_tasks_season_offset_days_check
        CHECK (season_offset_days BETWEEN 0 AND 120),
      ADD CONSTRAINT service_tasks_season_pair_check
        CHECK ((season_anchor IS NULL) = (season_offset_days IS NULL)),
      ADD CONSTRAINT service_tasks_season_no_day_interval_check
        CHECK (season_anchor IS NULL OR interval_days IS NULL);
    DO $$
    DECLARE old_check text;
    BEGIN
      SELECT conname INTO old_check FROM pg_constraint
      WHERE conrelid = 'service_tasks'::regclass AND contype = 'c'
        AND pg_get_constraintdef(oid) LIKE '%interval_meter IS NOT NULL%interval_days IS NOT NULL%';
      IF old_check IS NOT NULL THEN
        EXECUTE format('ALTER TABLE service_tasks DROP CONSTRAINT %I', old_check);
      END IF;
    END $$;
    ALTER TABLE service_tasks ADD CONSTRAINT service_tasks_interval_check
      CHECK (interval_meter IS NOT NULL OR interval_days IS NOT NULL OR season_anchor IS NOT NULL);
  `);
};

// Back down, a season task without a meter interval becomes a yearly one (365 days) rather than
// being lost; the season columns go.
export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    UPDATE service_tasks SET interval_days = 365
      WHERE season_anchor IS NOT NULL AND interval_meter IS NULL;
    ALTER TABLE service_tasks DROP CONSTRAINT service_tasks_interval_check;
    ALTER TABLE service_tasks DROP COLUMN season_anchor, DROP COLUMN season_offset_days;
    ALTER TABLE service_tasks ADD CONSTRAINT service_tasks_check
      CHECK (interval_meter IS NOT NULL OR interval_days IS NOT NULL);
  `);
};
