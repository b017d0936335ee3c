import { ConnectionError } from 'sequelize';

// PostgreSQL down, restarting or out of connections is not the request's fault and not a bug:
// the error handler answers 503 with Retry-After for these, so clients wait and try again.

/** SQLSTATE codes that mean "the server cannot take this now", not "this query is wrong". */
const UNAVAILABLE_SQLSTATES = new Set([
  '57P01', // admin_shutdown: the server is stopping (pg_ctl stop/restart)
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now: starting up, shutting down, in recovery
  '53300', // too_many_connections
  '08000', // connection_exception
  '08001', // sqlclient_unable_to_establish_sqlconnection
  '08003', // connection_does_not_exist
  '08004', // sqlserver_rejected_establishment_of_sqlconnection
  '08006', // connection_failure
]);

/** Socket-level codes from Node's net module while the server is away. */
const UNAVAILABLE_SOCKET_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
]);

/** Messages of the pg driver that carry no code. */
const UNAVAILABLE_MESSAGES = [
  /connection terminated/i,
  /client has encountered a connection error and is not queryable/i,
  /connection is closed/i,
  /timeout exceeded when trying to connect/i,
];

/** The error and the errors it wraps (Sequelize's parent/original, Error.cause), outermost first. */
function chainOf(error: unknown): unknown[] {
  const chain: unknown[] = [];
  let current: unknown = error;
  while (current && typeof current === 'object' && chain.length < 5 && !chain.includes(current)) {
    chain.push(current);
    const e = current as { parent?: unknown; original?: unknown; cause?: unknown };
    current = e.parent ?? e.original ?? e.cause;
  }
  return chain;
}

/** True when the error means the database cannot be reached now (503), not that the request is wrong. */
export function isDatabaseUnavailable(error: unknown): boolean {
  // ConnectionRefused, HostNotFound, AccessDenied, ConnectionAcquireTimeout… all extend it.
  if (error instanceof ConnectionError) return true;
  return chainOf(error).some((link) => {
    const { code, message } = link as { code?: unknown; message?: unknown };
    if (
      typeof code === 'string' &&
      (UNAVAILABLE_SQLSTATES.has(code) || UNAVAILABLE_SOCKET_CODES.has(code))
    )
      return true;
    return typeof message === 'string' && UNAVAILABLE_MESSAGES.some((m) => m.test(message));
  });
}

/** Seconds a client should wait before trying again. */
export const DATABASE_RETRY_AFTER_SECONDS = 5;
