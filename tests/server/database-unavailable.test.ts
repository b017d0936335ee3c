import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import {
  ConnectionAcquireTimeoutError,
  ConnectionError,
  ConnectionRefusedError,
  DatabaseError,
  UniqueConstraintError,
} from 'sequelize';
import { isDatabaseUnavailable } from '../../server/middlewares/database-unavailable';

/** An error as the pg driver builds it: a message and, from the server, a SQLSTATE code. */
function pgError(message: string, code?: string): Error & { code?: string; sql: string } {
  return Object.assign(new Error(message), { code, sql: 'SELECT 1' });
}

describe('isDatabaseUnavailable — which errors mean "PostgreSQL cannot answer now"', () => {
  it.each([
    [
      'refused connection (server down)',
      new ConnectionRefusedError(pgError('connect ECONNREFUSED', 'ECONNREFUSED')),
    ],
    [
      'starting up (57P03 at connect)',
      new ConnectionError(pgError('the database system is starting up', '57P03')),
    ],
    ['pool acquire timeout', new ConnectionAcquireTimeoutError(new Error('Operation timeout'))],
    [
      'shut down mid-query (57P01)',
      new DatabaseError(pgError('terminating connection due to administrator command', '57P01')),
    ],
    [
      'connection terminated mid-query (no code)',
      new DatabaseError(pgError('Connection terminated unexpectedly')),
    ],
    [
      'too many connections (53300)',
      new DatabaseError(pgError('sorry, too many clients already', '53300')),
    ],
    [
      'a socket reset wrapped as a cause',
      new Error('query failed', { cause: pgError('read ECONNRESET', 'ECONNRESET') }),
    ],
  ])('%s — unavailable', (_name, error) => {
    expect(isDatabaseUnavailable(error)).toBe(true);
  });

  it.each([
    ['a syntax error (42601)', new DatabaseError(pgError('syntax error at or near "x"', '42601'))],
    ['a numeric overflow (22003)', new DatabaseError(pgError('numeric field overflow', '22003'))],
    ['a unique violation', new UniqueConstraintError({ message: 'duplicate key' })],
    ['a plain bug', new TypeError("Cannot read properties of undefined (reading 'id')")],
    ['not an error at all', 'oops'],
  ])('%s — not unavailable', (_name, error) => {
    expect(isDatabaseUnavailable(error)).toBe(false);
  });
});

/** A port nothing listens on: bound by us a moment ago, then released. */
async function closedPort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as net.AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

/**
 * A stand-in for a PostgreSQL server that is still starting: it answers every start-up message with
 * the FATAL ErrorResponse (SQLSTATE 57P03) a real one sends during recovery, then hangs up.
 */
function startingUpServer(): net.Server {
  const field = (type: string, value: string) =>
    Buffer.concat([Buffer.from(type), Buffer.from(`${value}\0`)]);
  const fields = Buffer.concat([
    field('S', 'FATAL'),
    field('V', 'FATAL'),
    field('C', '57P03'),
    field('M', 'the database system is starting up'),
    Buffer.from([0]),
  ]);
  const length = Buffer.alloc(4);
  length.writeInt32BE(fields.length + 4);
  const reply = Buffer.concat([Buffer.from('E'), length, fields]);
  return net.createServer((socket) => {
    socket.once('data', () => socket.end(reply));
    socket.on('error', () => undefined);
  });
}

const signIn = (app: Express) =>
  request(app)
    .post('/api/v1/auth/sign-in')
    .send({ email: 'ada@test.example', password: 'correct-horse-battery' });

/** Builds the app against a database URL of our choosing, on freshly loaded modules. */
async function appWithDatabase(url: string): Promise<{ app: Express; close: () => Promise<void> }> {
  const saved = process.env.DATABASE_URL;
  process.env.DATABASE_URL = url;
  vi.resetModules(); // a fresh env, pool and app for this URL
  try {
    const { createApp } = await import('../../server/app');
    const { sequelize } = await import('../../server/db');
    return { app: createApp(), close: () => sequelize.close() };
  } finally {
    process.env.DATABASE_URL = saved;
  }
}

describe('API with PostgreSQL down or starting — 503 with Retry-After, never 500', () => {
  let fake: net.Server;
  let fakePort: number;
  let deadPort: number;

  beforeAll(async () => {
    deadPort = await closedPort();
    fake = startingUpServer();
    await new Promise<void>((resolve) => fake.listen(0, '127.0.0.1', resolve));
    fakePort = (fake.address() as net.AddressInfo).port;
  });
  afterAll(() => new Promise<void>((resolve) => fake.close(() => resolve())));

  it('sign-in — nothing listens on the database port — 503 unavailable with Retry-After and a plain message', async () => {
    const { app, close } = await appWithDatabase(
      `postgres://hourstone:x@127.0.0.1:${deadPort}/hourstone`,
    );
    try {
      const res = await signIn(app);
      expect(res.status).toBe(503);
      // wait 5 s before trying again (common practice: a few seconds for a restart)
      expect(res.headers['retry-after']).toBe('5');
      expect(res.body.error.code).toBe('unavailable');
      expect(res.body.error.message).toMatch(/database is not answering.*try again/i);
      expect(res.body.error.message).not.toMatch(/ECONNREFUSED|sequelize/i);

      // The server is the same one when the database is away; it answers its health check.
      expect((await request(app).get('/api/v1/health')).status).toBe(200);
    } finally {
      await close();
    }
  });

  it('sign-in — the database answers 57P03 "starting up" — 503 unavailable', async () => {
    const { app, close } = await appWithDatabase(
      `postgres://hourstone:x@127.0.0.1:${fakePort}/hourstone`,
    );
    try {
      const res = await signIn(app);
      expect(res.status).toBe(503);
      // wait 5 s before trying again (common practice: a few seconds for a restart)
      expect(res.headers['retry-after']).toBe('5');
      expect(res.body.error.code).toBe('unavailable');
    } finally {
      await close();
    }
  });
});
