// Applies pending migrations (umzug). Run by npm start, npm test and npm run db:migrate.
import { migrator } from '../server/migrator';
import { sequelize } from '../server/db';

const applied = await migrator.up();
console.log(
  applied.length
    ? `migrations: applied ${applied.map((m) => m.name).join(', ')}`
    : 'migrations: up to date',
);
await sequelize.close();
