// How the matrix calls signing up, each person's own account, and the organization itself.
import { sequelize } from '../../../server/db';
import { Membership } from '../../../server/models';
import { issueVerification } from '../../../server/services/email-verifications';
import { hashPassword } from '../../../server/infra/password-hash';
import {
  TEST_PASSWORD,
  createMember,
  createOrganization,
  createUser,
} from '../../support/factories';
import type { Case, Ctx } from './cases-fleet';
import { sessionCookie } from './harness';
import { TZ } from './seed-kit';

let n = 0;
const NEW_PASSWORD = 'a-long-new-passphrase';
const person = (c: Ctx) => (c.caller === 'anonymous' ? c.w.farm.manager : c.w.users[c.caller]);

/** An e-mail link of a person of its own: confirming a sign-up, or an address change. */
async function emailLink(purpose: 'sign_up' | 'email_change') {
  const user = purpose === 'email_change' ? await createUser() : null;
  const email = `linked${++n}@test.example`;
  const passwordHash = user ? null : await hashPassword(NEW_PASSWORD);
  const { token } = await sequelize.transaction((transaction) =>
    issueVerification(
      { purpose, email, userId: user?.id ?? null, name: user ? null : 'New Person', passwordHash },
      transaction,
    ),
  );
  return token;
}

/** The organization the route is about: the farm's own, or another (for the stranger, the farm). */
const organizationOf = (c: Ctx) =>
  c.side === 'own' || c.caller === 'stranger' ? c.w.farm.org : c.w.other.org;

/** Someone in the caller's place, so deleting an account never deletes a caller of the matrix. */
async function standIn(c: Ctx) {
  const role = c.caller === 'technician' ? 'technician' : 'operator';
  return sessionCookie((await createMember(c.w.farm.org, role)).user);
}

export const ACCOUNT_CASES: Record<string, Case> = {
  'GET /auth/sign-up': { ids: 'none', build: () => ({ params: {} }) },
  'POST /auth/sign-up': {
    ids: 'none',
    build: () => ({
      params: {},
      body: { name: 'New Person', email: `signed.up${++n}@test.example`, password: NEW_PASSWORD },
    }),
  },
  'POST /auth/verify-email': {
    ids: 'none',
    build: async () => ({ params: {}, body: { token: await emailLink('sign_up') } }),
  },
  'POST /account/email/confirm': {
    ids: 'none',
    build: async () => ({ params: {}, body: { token: await emailLink('email_change') } }),
  },
  'GET /account': { ids: 'none', build: () => ({ params: {} }) },
  'PATCH /account': {
    ids: 'none',
    build: (c) => ({ params: {}, body: { name: person(c).name } }),
  },
  'POST /account/email': {
    ids: 'none',
    build: () => ({
      params: {},
      body: { email: `moving${++n}@test.example`, currentPassword: TEST_PASSWORD },
    }),
  },
  'DELETE /account': {
    ids: 'none',
    build: async (c) => ({
      params: {},
      body: { currentPassword: TEST_PASSWORD },
      ...(c.succeeds && { cookie: await standIn(c) }),
    }),
  },
  'POST /organizations': {
    ids: 'none',
    build: () => ({
      params: {},
      body: { kind: 'farm', name: `Test Farm N${++n}`, timeZone: TZ, currency: 'USD' },
    }),
    // the caller runs one more farm from now on: the rest of the matrix wants it as seeded
    undo: async (_c, body) => {
      await Membership.destroy({ where: { organizationId: body.data!.id! } });
    },
  },
  'GET /organizations/{orgId}': {
    ids: 'path',
    build: (c) => ({ params: { orgId: organizationOf(c).id } }),
  },
  'PATCH /organizations/{orgId}': {
    ids: 'path',
    build: (c) => ({ params: { orgId: organizationOf(c).id }, body: { labourRateMinor: 6500 } }),
  },
  'DELETE /organizations/{orgId}': {
    ids: 'path',
    // the farm manager deletes a farm of its own making, not the matrix's farm
    build: async (c) => {
      let org = organizationOf(c);
      if (c.succeeds) {
        org = await createOrganization({ name: `Test Farm N${++n}`, timeZone: TZ });
        await Membership.create({ organizationId: org.id, userId: person(c).id, role: 'manager' });
      }
      return { params: { orgId: org.id }, body: { confirmName: org.name } };
    },
  },
};
