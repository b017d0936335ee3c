// What the matrix's world and its cells make records with: the meter the world reads, a photo,
// and small makers of machines, proposals, walkarounds and dealers' requests.
import { randomUUID } from 'node:crypto';
import {
  DealerLink,
  MachineOperator,
  ServiceBooking,
  type Machine,
  type Organization,
  type ServiceTask,
  type User,
} from '../../../server/models';
import { newToken } from '../../../server/infra/tokens';
import { addDaysIso, todayIso } from '../../../shared/domain';
import { addReadings, createMachine } from '../../support/factories';
import { send, type Sent } from './harness';
import type { FarmWorld } from './world';

export const TZ = 'America/Chicago';
/** The meter every world machine reads now (its last reading, two days ago). */
export const LAST_METER = 1300;
/** A 1 × 1 PNG: enough for the server to check the type by content and make a thumbnail. */
export const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);
export const today = () => todayIso(TZ);
export const inDays = (n: number) => addDaysIso(today(), n);

/** A request as this farm's manager, for setting up; anything but 2xx stops the run. */
export async function asManager(farm: FarmWorld, method: string, sent: Sent) {
  const res = await send(method, farm.managerCookie, sent);
  if (res.status >= 300)
    throw new Error(`setup ${method} ${sent.path}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { data: Record<string, unknown> & { id: string } };
}

export async function machineWithReadings(org: Organization, fleetNumber: string) {
  const machine = await createMachine(org, { fleetNumber, name: `Test tractor ${fleetNumber}` });
  await addReadings(
    machine,
    [32, 22, 12, 2].map((daysAgo, i) => ({ daysAgo, value: LAST_METER - 300 + i * 100 })),
  );
  return machine;
}

export async function assign(machine: Machine, user: User) {
  await MachineOperator.create({
    organizationId: machine.organizationId,
    machineId: machine.id,
    userId: user.id,
  });
}

export const bookingItem = (machine: Machine, task: ServiceTask) => ({
  machineId: machine.id,
  fleetNumber: machine.fleetNumber,
  machineName: machine.name,
  tasks: [{ taskId: task.id, name: task.name }],
  serviceRecordId: null,
});

export async function proposal(farm: FarmWorld, dealer: Organization, by: User) {
  const booking = await ServiceBooking.create({
    organizationId: farm.org.id,
    dealerOrganizationId: dealer.id,
    proposedBy: by.id,
    proposedFor: inDays(7),
    items: [bookingItem(farm.machine, farm.task)],
    note: 'Proposed in the matrix setup',
    decidedBy: null,
    decidedAt: null,
  });
  return booking.id;
}

/** A walkaround of every item answered ok, on the meter as it reads now. */
export const walkaroundBody = (
  machine: Machine,
  items: { itemId: string; photoId?: string }[] = [{ itemId: 'tyres' }],
) => ({
  machineId: machine.id,
  clientId: randomUUID(),
  purpose: 'use',
  meterValue: LAST_METER,
  items: items.map((i) => ({ result: 'ok', ...i })),
});

/** A dealer's request for access waiting for a farm manager, with the token its e-mail carries. */
export async function pendingRequest(dealer: Organization, advisor: User) {
  const { token, hash } = newToken();
  const link = await DealerLink.create({
    dealerOrganizationId: dealer.id,
    farmOrganizationId: null,
    access: 'view',
    status: 'pending',
    initiatedBy: 'dealer',
    invitedBy: advisor.id,
    invitedEmail: 'a.farm.manager@test.example',
    tokenHash: hash,
    expiresAt: new Date(Date.now() + 7 * 86_400_000),
    acceptedBy: null,
    acceptedAt: null,
    revokedBy: null,
    revokedAt: null,
  });
  return { id: link.id, token };
}
