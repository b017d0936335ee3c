import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { RESET_LIMIT_PER_EMAIL } from '../../server/middlewares/rate-limit';
import {
  delayAfter,
  FORGET_AFTER_HOURS,
  MAX_DELAY_SECONDS,
} from '../../server/services/sign-in-throttle';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, TEST_PASSWORD } from '../support/factories';

const app = createApp();
const ADDRESS_LIMIT = Number(process.env.SIGN_IN_LIMIT_PER_ADDRESS ?? 30);

const signIn = (email: string, password: string, address = '203.0.113.7') =>
  request(app)
    .post('/api/v1/auth/sign-in')
    .set('X-Forwarded-For', address)
    .send({ email, password });

// The wait is set by the database clock; instead of sleeping through it, a test moves it.
const moveWait = (email: string, interval: string) =>
  sequelize.query(
    `UPDATE sign_in_throttle SET next_attempt_at = now() + interval '${interval}' WHERE key = :key`,
    { replacements: { key: email.toLowerCase() } },
  );
/** As if the account's wait had passed. */
const waitIsOver = (email: string) => moveWait(email, '-1 second');
/** As if the next attempt came soon after the last failure (well within any wait). */
const stillWaiting = (email: string) => moveWait(email, '10 minutes');

/** The account's failures and the wait its last attempt set (seconds), as stored. */
async function throttleOf(email: string) {
  const [rows] = (await sequelize.query(
    `SELECT failures,
       extract(epoch FROM next_attempt_at - (forget_at - make_interval(hours => :hours)))::float AS wait
     FROM sign_in_throttle WHERE key = :key`,
    { replacements: { key: email.toLowerCase(), hours: FORGET_AFTER_HOURS } },
  )) as [{ failures: number; wait: number }[], unknown];
  return rows[0] ?? { failures: 0, wait: 0 };
}

describe('sign-in throttle — delay after failures (pure)', () => {
  it('delayAfter — free for the first 4 failures, then 1 s doubling, capped at 15 minutes', () => {
    expect([0, 1, 4].map(delayAfter)).toEqual([0, 0, 0]);
    expect([5, 6, 7, 8].map(delayAfter)).toEqual([1, 2, 4, 8]);
    expect(delayAfter(40)).toBe(MAX_DELAY_SECONDS);
    expect(MAX_DELAY_SECONDS).toBe(900);
  });
});

describe('sign-in throttle — failures count, people do not', () => {
  beforeEach(resetDatabase);

  it('one farm office address — 13 people signing in 3 times each (past the address limit) all get 200', async () => {
    const org = await createOrganization();
    const people = await Promise.all(
      Array.from({ length: 13 }, () => createMember(org, 'operator')),
    );
    const statuses: number[] = [];
    for (let round = 0; round < 3; round++) {
      for (const { user } of people)
        statuses.push((await signIn(user.email, TEST_PASSWORD)).status);
    }
    expect(statuses.length).toBeGreaterThan(ADDRESS_LIMIT);
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
  });

  it('one address — failed sign-ins across accounts are limited: the one past the limit answers 429', async () => {
    const statuses: number[] = [];
    for (let i = 0; i <= ADDRESS_LIMIT; i++) {
      statuses.push((await signIn(`someone${i}@test.example`, 'whatever')).status);
    }
    expect(statuses.slice(0, ADDRESS_LIMIT).every((s) => s === 401)).toBe(true);
    expect(statuses[ADDRESS_LIMIT]).toBe(429);
  });

  it('one account — after 5 failures each attempt waits longer (1 s, 2 s, 4 s); the right password after the wait signs in', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const waits: number[] = [];
    for (let i = 0; i < 7; i++) {
      expect((await signIn(user.email, 'wrong-wrong')).status).toBe(401);
      waits.push((await throttleOf(user.email)).wait);
      await waitIsOver(user.email);
    }
    expect(waits).toEqual([0, 0, 0, 0, 1, 2, 4]);

    await stillWaiting(user.email);
    const early = await signIn(user.email, TEST_PASSWORD); // even the right password waits
    expect(early.status).toBe(429);
    expect(early.body.error).toMatchObject({ code: 'throttled' });
    expect(early.body.error.message).toMatch(/Wait (10|9) minutes and try again/);
    expect(Number(early.headers['retry-after'])).toBeGreaterThan(500);
    expect((await throttleOf(user.email)).failures).toBe(7); // the refused attempt did not count

    await waitIsOver(user.email);
    expect((await signIn(user.email, TEST_PASSWORD)).status).toBe(200);
    expect(await throttleOf(user.email)).toEqual({ failures: 0, wait: 0 });
    expect((await signIn(user.email, 'one-more-typo')).status).toBe(401); // starts afresh
  });

  it('one account — parallel guesses after many failures: one is checked, the others wait (429)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    await sequelize.query(
      `INSERT INTO sign_in_throttle (key, failures, next_attempt_at, forget_at)
       VALUES (:key, 12, now() - interval '1 second', now() + interval '1 day')`,
      { replacements: { key: user.email } },
    );
    const answers = await Promise.all(
      Array.from({ length: 8 }, (_, i) => signIn(user.email, `guess-${i}`)),
    );
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses).toEqual([401, 429, 429, 429, 429, 429, 429, 429]);
    expect((await throttleOf(user.email)).failures).toBe(13);
  });

  it('the delay of one account does not touch another signing in from the same address', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const { user: other } = await createMember(org, 'operator');
    for (let i = 0; i < 5; i++) await signIn(user.email, 'wrong-wrong');
    await stillWaiting(user.email);
    expect((await signIn(user.email, TEST_PASSWORD)).status).toBe(429);
    expect((await signIn(other.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('an unknown e-mail is slowed down exactly like a known one (same answers, same stored waits)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const trace = async (email: string) => {
      const out: string[] = [];
      for (let i = 0; i < 6; i++) {
        const r = await signIn(email, 'wrong-wrong');
        out.push(`${r.status} ${r.body.error.code} wait ${(await throttleOf(email)).wait}`);
        await waitIsOver(email);
      }
      await stillWaiting(email);
      const r = await signIn(email, 'wrong-wrong');
      out.push(`${r.status} ${r.body.error.code} ${r.body.error.message}`);
      return out;
    };
    const unknown = await trace('nobody-here@test.example');
    expect(unknown).toEqual(await trace(user.email));
    expect(unknown.at(-1)).toMatch(/^429 throttled/);
  });
});

describe('password reset — its own limit, never the sign-in one', () => {
  beforeEach(resetDatabase);

  it('an address locked out of sign-in (429) can still ask for a reset link (202)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    for (let i = 0; i <= ADDRESS_LIMIT; i++) await signIn(`typo${i}@test.example`, 'x');
    expect((await signIn(user.email, TEST_PASSWORD)).status).toBe(429);
    const reset = await request(app)
      .post('/api/v1/auth/password-reset')
      .set('X-Forwarded-For', '203.0.113.7')
      .send({ email: user.email });
    expect(reset.status).toBe(202);
  });

  it('reset requests for one e-mail are limited (429 past the limit), known or not alike', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    for (const email of [user.email, 'ghost@test.example']) {
      const statuses: number[] = [];
      for (let i = 0; i <= RESET_LIMIT_PER_EMAIL; i++) {
        const r = await request(app)
          .post('/api/v1/auth/password-reset')
          .set('X-Forwarded-For', `192.0.2.${i + email.length}`)
          .send({ email });
        statuses.push(r.status);
      }
      expect(statuses).toEqual([...Array(RESET_LIMIT_PER_EMAIL).fill(202), 429]);
    }
  });
});
