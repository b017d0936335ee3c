import bcrypt from 'bcryptjs';
import request from 'supertest';
import type { Express } from 'express';
import {
  Machine,
  MachineMeter,
  Membership,
  MeterReading,
  Organization,
  ServiceTask,
  User,
} from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';
import {
  METER_KIND_UNITS,
  type MachineCategory,
  type MeterKind,
  type MeterUnit,
  type Role,
} from '../../shared/constants';

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

export async function createMachine(
  organization: Organization,
  overrides: Partial<{
    fleetNumber: string;
    name: string;
    category: MachineCategory;
    meterUnit: MeterUnit;
    status: Machine['status'];
    seasonMonths: number[];
  }> = {},
) {
  const n = next();
  return Machine.create({
    organizationId: organization.id,
    fleetNumber: `M-${n}`,
    name: `Machine ${n}`,
    category: 'tractor',
    year: 2020,
    purchasePriceMinor: null,
    listPriceMinor: null,
    photoKey: null,
    ...overrides,
  });
}

/** Adds a meter beside the machine's primary one (issue 13). */
export function createMeter(machine: Machine, kind: MeterKind, label = '') {
  return MachineMeter.create({
    organizationId: machine.organizationId,
    machineId: machine.id,
    kind,
    unit: METER_KIND_UNITS[kind],
    label,
    position: 1,
  });
}

/**
 * Inserts readings directly (bypassing the rules) and refreshes the machine's forecast; each on
 * the meter it names, else the machine's primary.
 */
export async function addReadings(
  machine: Machine,
  points: { daysAgo: number; value: number; meterId?: string }[],
  now = new Date(),
) {
  await MeterReading.bulkCreate(
    points.map((p) => ({
      organizationId: machine.organizationId,
      machineId: machine.id,
      ...(p.meterId && { meterId: p.meterId }),
      value: p.value,
      lifetimeValue: p.value,
      takenAt: new Date(now.getTime() - p.daysAgo * 86_400_000),
      source: 'manual' as const,
      enteredBy: null,
      importKey: null,
    })),
  );
  await refreshMachineForecast(machine.id, machine.organizationId);
}

export async function createTask(
  machine: Machine,
  overrides: Partial<ServiceTask['_creationAttributes']> = {},
) {
  const task = await ServiceTask.create({
    organizationId: machine.organizationId,
    machineId: machine.id,
    name: 'Engine oil and filter',
    intervalMeter: 250,
    intervalDays: null,
    firstServiceMeter: null,
    warnMeter: 25,
    warnDays: null,
    labourHours: 1,
    lastDoneMeter: null,
    lastDoneOn: null,
    ...overrides,
  });
  await refreshMachineForecast(machine.id, machine.organizationId);
  return task;
}
