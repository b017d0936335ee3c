// The yard the walkaround tests work in: an operator assigned to T-01 (readings up to 2,000 h),
// a technician and a manager; `submission()` answers every item of the built-in tractor list ok.
import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/app';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { MachineOperator } from '../../server/models';
import { defaultChecklist } from '../../server/services/checklist-defaults';

export const app = createApp();

/** A farm with an operator assigned to T-01 (a tractor with readings up to 2,000 h). */
export async function yard() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user: op } = await createMember(org, 'operator');
  const { user: tech } = await createMember(org, 'technician');
  const { user: manager } = await createMember(org, 'manager');
  const machine = await createMachine(org, { fleetNumber: 'T-01', category: 'tractor' });
  await MachineOperator.create({ organizationId: org.id, machineId: machine.id, userId: op.id });
  await addReadings(machine, [
    { daysAgo: 10, value: 1950 },
    { daysAgo: 1, value: 2000 },
  ]);
  const base = `/api/v1/organizations/${org.id}`;
  return {
    org,
    op,
    tech,
    manager,
    machine,
    base,
    opAgent: await signedInAgent(app, op),
    checklistUrl: `${base}/machines/${machine.id}/checklist`,
  };
}

export const tractorItems = defaultChecklist('tractor').items;

/** Answers for every item of the built-in tractor list: ok unless named. */
export function answers(
  overrides: Record<string, { result: string; note?: string; photoId?: string }> = {},
) {
  return tractorItems.map((i) => ({ itemId: i.id, ...(overrides[i.id] ?? { result: 'ok' }) }));
}

export const hoursAgo = (h: number) => new Date(Date.now() - h * 3600_000).toISOString();

export const submission = (machineId: string, extra: Record<string, unknown> = {}) => ({
  machineId,
  clientId: randomUUID(),
  meterValue: 2004.5,
  items: answers(),
  ...extra,
});
