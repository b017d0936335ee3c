// Types of pgbouncer.mjs for the TypeScript scripts that use it.
export interface PgbouncerHandle {
  /** DATABASE_URL through pgbouncer (same role, password and database) */
  databaseUrl: string;
  /** pgbouncer's admin console (SHOW POOLS, SHOW STATS), for the app's role */
  adminUrl: string;
  port: number;
  logFile: string;
  /** process id of the running pgbouncer (from its pid file) */
  pid(): number | undefined;
  stop(): Promise<void>;
}

export function startPgbouncer(options: {
  name: string;
  port: number;
  databaseUrl: string;
  poolSize?: number;
  maxClients?: number;
}): Promise<PgbouncerHandle>;

export class PgbouncerError extends Error {}
