// Where each kind of connection goes: DATABASE_DIRECT_URL for the worker's LISTEN (a transaction
// pooler cannot carry it) and DATABASE_READ_URL for the read-only reports. The settings are read
// once when server/env.ts loads, so the "set" cases load a fresh copy of the modules with the
// variable stubbed (vi.resetModules) and talk to the same test database through it.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { QueryTypes } from 'sequelize';
import { databaseTargets } from '../../server/env';
import { readDb, sequelize } from '../../server/db';
import { resetDatabase } from '../support/db';
import { signedInAgent } from '../support/factories';
import { api, app, dealerWorld } from './dealer-fixture';

const READ_NAME = 'hourstone-read-check';
const withApplicationName = (url: string, name: string) => {
  const u = new URL(url);
  u.searchParams.set('application_name', name);
  return u.toString();
};
const connectionsNamed = async (name: string) =>
  (
    await sequelize.query<{ n: number }>(
      'SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = :name',
      { replacements: { name }, type: QueryTypes.SELECT },
    )
  )[0].n;

afterEach(() => {
  vi.unstubAllEnvs();
  vi.resetModules();
});

describe('database targets — main, direct (LISTEN) and read (reports)', () => {
  it('databaseTargets — unset: LISTEN and reports use DATABASE_URL; set: each goes where it is told', () => {
    const main = 'postgres://a:b@127.0.0.1:6432/app';
    expect(databaseTargets({ DATABASE_URL: main })).toEqual({ main, direct: main, read: null });
    expect(
      databaseTargets({
        DATABASE_URL: main,
        DATABASE_DIRECT_URL: 'postgres://a:b@127.0.0.1:5432/app',
        DATABASE_READ_URL: 'postgres://a:b@replica:5432/app',
      }),
    ).toEqual({
      main,
      direct: 'postgres://a:b@127.0.0.1:5432/app',
      read: 'postgres://a:b@replica:5432/app',
    });
  });

  it('DATABASE_READ_URL unset (as in every other test): the reports use the one pool of the app', () => {
    expect(process.env.DATABASE_READ_URL ?? '').toBe('');
    expect(readDb).toBe(sequelize);
  });

  it('DATABASE_READ_URL set: the dealer board reads its rows through that pool (seen by its application_name), with the same answer', async () => {
    await resetDatabase();
    const w = await dealerWorld();
    const expected = await w.advisorAgent.get(api(w.dealer.id, '/board'));
    expect(expected.status).toBe(200);

    vi.resetModules();
    vi.stubEnv('DATABASE_READ_URL', withApplicationName(process.env.DATABASE_URL!, READ_NAME));
    const db = await import('../../server/db');
    const { createApp } = await import('../../server/app');
    try {
      expect(db.readDb).not.toBe(db.sequelize);
      const replicaApp = createApp();
      const agent = await signedInAgent(replicaApp, w.advisor);
      expect(await connectionsNamed(READ_NAME)).toBe(0); // signing in did not touch it
      const res = await agent.get(api(w.dealer.id, '/board'));
      expect(res.status).toBe(200);
      expect(res.body).toEqual(expected.body);
      // the pool keeps its connections open after the reads (10 s idle)
      expect(await connectionsNamed(READ_NAME)).toBeGreaterThan(0);
    } finally {
      await db.closeDatabases();
    }
    // the app the other tests use is untouched
    expect((await w.advisorAgent.get(api(w.dealer.id, '/board'))).status).toBe(200);
    expect(app).toBeDefined();
  });

  it('DATABASE_DIRECT_URL set: the outbox listener connects there, not to DATABASE_URL', async () => {
    // DATABASE_URL points where nothing listens: only the direct URL can give the LISTEN a home
    const real = new URL(process.env.DATABASE_URL!);
    const nowhere = new URL(real);
    nowhere.port = '9'; // discard port: nothing accepts PostgreSQL there
    vi.resetModules();
    vi.stubEnv('DATABASE_URL', nowhere.toString());
    vi.stubEnv('DATABASE_DIRECT_URL', real.toString());
    const { listenForOutbox, LISTENER_APPLICATION_NAME } = await import('../../jobs/outbox-wakeup');
    const before = await connectionsNamed(LISTENER_APPLICATION_NAME);
    const listener = listenForOutbox(() => undefined, { retryMs: 100 });
    try {
      await listener.ready;
      expect(await connectionsNamed(LISTENER_APPLICATION_NAME)).toBe(before + 1);
    } finally {
      await listener.stop();
    }
  });
});
