import bcrypt from 'bcryptjs';
import request from 'supertest';
import type { Express } from 'express';
import { Membership, Organization, User } from '../../server/models';
import type { Role } from '../../shared/constants';

let seq = 0;
const next = () => ++seq;

export const TEST_PASSWORD = 'correct-horse-battery';
const passwordHash = bcrypt.hashSync(TEST_PASSWORD, 4);

export async function createOrganization(
  overrides: Partial<Organization['_creationAttributes']> = {},
) {
  return Organization.create({
    name: `Test Farm ${next()}`,
    kind: 'farm',
    timeZone: 'America/Chicago',
    units: 'metric',
    ...overrides,
  });
}

export async function createUser(overrides: Partial<User['_creationAttributes']> = {}) {
  const n = next();
  return User.create({
    email: `person${n}@test.example`,
    name: `Person ${n}`,
    passwordHash,
    ...overrides,
  });
}

/** A user with a membership of the given role in the organization. */
export async function createMember(
  organization: Organization,
  role: Role,
  overrides: Partial<User['_creationAttributes']> = {},
) {
  const user = await createUser(overrides);
  const membership = await Membership.create({
    organizationId: organization.id,
    userId: user.id,
    role,
  });
  return { user, membership };
}

/** A supertest agent signed in as the user (cookie kept between calls). */
export async function signedInAgent(app: Express, user: User) {
  const agent = request.agent(app);
  const res = await agent
    .post('/api/v1/auth/sign-in')
    .send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200)
    throw new Error(`sign-in failed in test setup: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
