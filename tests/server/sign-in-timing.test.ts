// Parity of two paths in one run, not a speed target: a known and an unknown e-mail must cost
// the same, so the time of an answer cannot tell whether an account exists. Requests of the
// two kinds are interleaved (alternating which goes first) so load on the machine hits both.
import { beforeEach, describe, expect, it, vi } from 'vitest';

// Passwords are hashed at a production-like cost here (the suite uses 4 to be quick), so that
// skipping bcrypt for an unknown e-mail would show; set before the server reads its settings.
vi.hoisted(() => {
  process.env.BCRYPT_ROUNDS = '10';
});

import request from 'supertest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { User } from '../../server/models';
import { hashPassword } from '../../server/services/accounts';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';

const app = createApp();
const TRIES = 20;
const PARITY = 0.2;

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length / 2;
  return sorted.length % 2 ? sorted[Math.floor(mid)] : (sorted[mid - 1] + sorted[mid]) / 2;
};

/** Runs `known` and `unknown` TRIES times each, interleaved; the medians of their durations (ms). */
async function medians(
  known: (i: number) => Promise<request.Response>,
  unknown: (i: number) => Promise<request.Response>,
  expectStatus: number,
) {
  const times = { known: [] as number[], unknown: [] as number[] };
  const timed = async (kind: 'known' | 'unknown', i: number) => {
    // Counters are cleared first (untimed) so throttles never answer instead of the real path.
    await sequelize.query('DELETE FROM rate_limit_hits; DELETE FROM sign_in_throttle;');
    const started = performance.now();
    const res = await (kind === 'known' ? known(i) : unknown(i));
    times[kind].push(performance.now() - started);
    expect(res.status).toBe(expectStatus);
  };
  for (let i = 0; i < TRIES; i++) {
    const order = i % 2 ? (['known', 'unknown'] as const) : (['unknown', 'known'] as const);
    for (const kind of order) await timed(kind, i);
  }
  return { known: median(times.known), unknown: median(times.unknown) };
}

const relativeGap = ({ known, unknown }: { known: number; unknown: number }) =>
  Math.abs(known - unknown) / Math.max(known, unknown);

describe('timing parity — known vs unknown e-mail (medians of 20 interleaved tries)', () => {
  beforeEach(resetDatabase);

  it('sign-in — wrong password for an account vs an unknown e-mail — medians within 20 %', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    await User.update(
      { passwordHash: await hashPassword('the-real-password') },
      { where: { id: user.id } },
    );
    const signIn = (email: string) =>
      request(app).post('/api/v1/auth/sign-in').send({ email, password: 'a-wrong-guess' });
    const result = await medians(
      () => signIn(user.email),
      (i) => signIn(`nobody${i}@test.example`),
      401,
    );
    expect(relativeGap(result), JSON.stringify(result)).toBeLessThanOrEqual(PARITY);
  }, 120_000);

  it('password reset request — an account vs an unknown e-mail — medians within 20 %', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    const ask = (email: string) => request(app).post('/api/v1/auth/password-reset').send({ email });
    const result = await medians(
      () => ask(user.email),
      (i) => ask(`ghost${i}@test.example`),
      202,
    );
    expect(relativeGap(result), JSON.stringify(result)).toBeLessThanOrEqual(PARITY);
  }, 120_000);

  it('invitation — to an e-mail with an account elsewhere vs a new one — medians within 20 %', async () => {
    const org = await createOrganization();
    const elsewhere = await createOrganization();
    const { user: manager } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, manager);
    const existing = await Promise.all(
      Array.from({ length: TRIES }, () => createMember(elsewhere, 'operator')),
    );
    const invite = (email: string) =>
      agent
        .post(`/api/v1/organizations/${org.id}/invitations`)
        .send({ email, name: 'Invited Person', role: 'operator' });
    const result = await medians(
      (i) => invite(existing[i].user.email),
      (i) => invite(`newcomer${i}@test.example`),
      201,
    );
    expect(relativeGap(result), JSON.stringify(result)).toBeLessThanOrEqual(PARITY);
  }, 120_000);
});
