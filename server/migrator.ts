import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { SequelizeStorage, Umzug, type MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';
import { sequelize } from './db';

export type Migration = MigrationFn<QueryInterface>;

const dir = path.join(path.dirname(fileURLToPath(import.meta.url)), 'migrations');

// Migrations are ordered by file name and never edited once landed.
export const migrator = new Umzug<QueryInterface>({
  migrations: {
    glob: ['*.ts', { cwd: dir }],
    resolve: ({ name, path: file, context }) => {
      const load = () =>
        import(pathToFileURL(file!).href) as Promise<{ up: Migration; down: Migration }>;
      return {
        name,
        up: async () => (await load()).up({ name, context }),
        down: async () => (await load()).down({ name, context }),
      };
    },
  },
  context: sequelize.getQueryInterface(),
  storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
  logger: undefined,
});
