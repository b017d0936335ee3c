// A small dealer world for the dealer tests: a dealer with one advisor, linked to one farm with
// `service` access and one with `view`; a third farm not linked; a second dealer not linked.
import { createApp } from '../../server/app';
import { DealerLink, type Organization } from '../../server/models';
import type { DealerAccess } from '../../shared/schemas/dealers';
import { todayIso } from '../../shared/domain';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';

export const app = createApp();
export const TZ = 'America/Chicago';
const DAY = 86_400_000;
export const daysAgoIso = (n: number) => todayIso(TZ, new Date(Date.now() - n * DAY));
export const api = (orgId: string, rest = '') => `/api/v1/organizations/${orgId}${rest}`;

export async function linkDealer(
  dealer: Organization,
  farm: Organization,
  access: DealerAccess,
  status: 'active' | 'pending' | 'revoked' = 'active',
) {
  return DealerLink.create({
    dealerOrganizationId: dealer.id,
    farmOrganizationId: farm.id,
    access,
    status,
    initiatedBy: 'farm',
    invitedBy: null,
    tokenHash: null,
    expiresAt: null,
    acceptedBy: null,
    acceptedAt: status === 'active' ? new Date() : null,
    revokedBy: null,
    revokedAt: status === 'revoked' ? new Date() : null,
  });
}

/**
 * A farm with a manager, technician and operator; T-01 at 10 h/day, readings up to 1,300 h
 * (2 days ago); an overdue oil change (due 1,250 h) and hydraulic filters due at 1,400 h.
 */
export async function farmWithFleet(name: string, fleetNumber = 'T-01') {
  const org = await createOrganization({ name, timeZone: TZ });
  const { user: manager } = await createMember(org, 'manager');
  const { user: tech } = await createMember(org, 'technician');
  const { user: op } = await createMember(org, 'operator');
  const machine = await createMachine(org, { fleetNumber, name: `${name} tractor` });
  await addReadings(
    machine,
    [0, 10, 20, 30].map((d) => ({ daysAgo: 32 - d, value: 1000 + d * 10 })),
  );
  const oil = await createTask(machine, {
    name: 'Engine oil and filter',
    intervalMeter: 250,
    lastDoneMeter: 1000,
    lastDoneOn: daysAgoIso(32),
    warnMeter: 25,
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L' }],
  });
  const hydraulic = await createTask(machine, {
    name: 'Hydraulic filters',
    intervalMeter: 500,
    lastDoneMeter: 900,
    lastDoneOn: daysAgoIso(60),
    warnMeter: 50,
    parts: [{ partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 }],
  });
  return { org, manager, tech, op, machine, oil, hydraulic };
}

export async function dealerWorld() {
  const dealer = await createOrganization({ name: 'Test Dealer', kind: 'dealer', timeZone: TZ });
  const { user: advisor } = await createMember(dealer, 'advisor');
  const otherDealer = await createOrganization({ name: 'Other Dealer', kind: 'dealer' });
  const { user: otherAdvisor } = await createMember(otherDealer, 'advisor');
  const serviced = await farmWithFleet('Alder Farm', 'A-01');
  const viewed = await farmWithFleet('Birch Farm', 'B-01');
  const unlinked = await farmWithFleet('Cedar Farm', 'C-01');
  const serviceLink = await linkDealer(dealer, serviced.org, 'service');
  const viewLink = await linkDealer(dealer, viewed.org, 'view');
  return {
    dealer,
    advisor,
    otherDealer,
    otherAdvisor,
    serviced,
    viewed,
    unlinked,
    serviceLink,
    viewLink,
    advisorAgent: await signedInAgent(app, advisor),
  };
}
