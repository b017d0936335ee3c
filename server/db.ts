import pg from 'pg';
import { Sequelize } from 'sequelize';
import { databaseTargets, env } from './env';

// numeric → number (our magnitudes fit a double); date stays an ISO yyyy-mm-dd string.
pg.types.setTypeParser(1700, (v) => (v === null ? null : Number(v)));
pg.types.setTypeParser(1082, (v) => v);

// A fresh object for each instance: Sequelize writes the URL's parts into the options it is given.
const options = () =>
  ({
    dialect: 'postgres',
    logging: false,
    pool: { max: env.DATABASE_POOL_MAX },
    define: { underscored: true, timestamps: true },
  }) as const;

export const sequelize = new Sequelize(env.DATABASE_URL, options());

const readUrl = databaseTargets(env).read;
/**
 * What the read-only reports ask (raw statements only; the models stay on `sequelize`): a
 * replica's pool when DATABASE_READ_URL is set, else the same pool as everything else.
 */
export const readDb: Sequelize = readUrl ? new Sequelize(readUrl, options()) : sequelize;

/** Closes every pool this process opened (the API's and scripts' shutdown). */
export async function closeDatabases(): Promise<void> {
  await Promise.all([sequelize.close(), readDb === sequelize ? null : readDb.close()]);
}
