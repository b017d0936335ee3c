import pg from 'pg';
import { Sequelize } from 'sequelize';
import { env } from './env';

// numeric → number (our magnitudes fit a double); date stays an ISO yyyy-mm-dd string.
pg.types.setTypeParser(1700, (v) => (v === null ? null : Number(v)));
pg.types.setTypeParser(1082, (v) => v);

export const sequelize = new Sequelize(env.DATABASE_URL, {
  dialect: 'postgres',
  logging: false,
  pool: { max: env.DATABASE_POOL_MAX },
  define: { underscored: true, timestamps: true },
});
