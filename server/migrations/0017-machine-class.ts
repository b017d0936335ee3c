import type { Migration } from '../migrator';

// A machine's class (issue 11): finer than its category, it names the service library's set of
// tasks the machine was given. Nullable: existing machines keep their category and their tasks
// and have no class until a manager picks one. The values are written out here, not imported,
// as a migration never changes once it has landed; a new class comes with a new migration.
const CLASSES = [
  'row_crop_tractor',
  'articulated_tractor',
  'utility_loader_tractor',
  'combine',
  'sp_sprayer',
  'sp_windrower',
  'mower_conditioner',
  'round_baler',
  'square_baler',
  'forage_harvester',
  'telehandler',
  'mixer_wagon',
  'slurry_tanker',
  'grain_truck',
  'implement',
];

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE machines ADD COLUMN machine_class text
      CONSTRAINT machines_machine_class_check
      CHECK (machine_class IN (${CLASSES.map((c) => `'${c}'`).join(', ')}));
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE machines DROP COLUMN machine_class;');
};
