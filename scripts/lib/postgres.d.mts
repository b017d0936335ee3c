// Types of postgres.mjs for the TypeScript scripts and tests that use it.
export interface PostgresHandle {
  databaseUrl: string;
  external: boolean;
  readonly startedHere: boolean;
  port?: number;
  pgData?: string;
  stop(): Promise<void>;
  /** Drops and recreates a database of this cluster (for a clean run). */
  recreateDatabase(db?: string): void;
}

export function startPostgres(options: {
  name: string;
  port?: number | string;
  database?: string;
  externalUrl?: string;
}): Promise<PostgresHandle>;

/** The folder holding initdb, pg_ctl, pg_dump and pg_restore, or undefined when none is found. */
export function findServerBinaries(): string | undefined;

export class PostgresError extends Error {}
