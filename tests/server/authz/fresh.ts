// Records made for one cell that is expected to succeed, so what it consumes or changes (a plan
// completed, a defect closed, a link revoked) is its own and every other cell finds the world as
// it was seeded. Refused cells use the world's records: refusing changes nothing, which the
// matrix checks.
import {
  Invitation,
  MeterReading,
  PasswordReset,
  type Machine,
  type Organization,
  type ServiceTask,
} from '../../../server/models';
import { newToken } from '../../../server/infra/tokens';
import { createMember, createOrganization, createUser, createTask } from '../../support/factories';
import { linkDealer } from '../dealer-fixture';
import { send } from './harness';
import { PNG, TZ, asManager, inDays, machineWithReadings, pendingRequest } from './seed-kit';
import type { FarmWorld } from './world';

let n = 0;
const next = () => ++n;

/** A machine of its own: tagged out, or in service with a restriction, when asked. */
export async function freshMachine(farm: FarmWorld, state?: 'tagged_out' | 'restricted') {
  const machine = await machineWithReadings(farm.org, `N-${next()}`);
  if (state === 'tagged_out') await machine.update({ status: state });
  if (state === 'restricted')
    await machine.update({ restrictionReason: 'Field only — no road', restrictedAt: new Date() });
  return machine;
}

export async function freshTask(
  farm: FarmWorld,
  machine: Machine = farm.machine,
  overrides: Partial<ServiceTask['_creationAttributes']> = {},
) {
  return createTask(machine, { name: `Fuel filter ${next()}`, intervalMeter: 500, ...overrides });
}

/** The last reading of a machine of its own, for correcting or deleting it. */
export async function freshReading(farm: FarmWorld) {
  const machine = await freshMachine(farm);
  const last = await MeterReading.findOne({
    where: { machineId: machine.id },
    order: [['takenAt', 'DESC']],
  });
  return last!.id;
}

/** A machine with the photo uploaded, for removing it. */
export async function machineWithPhoto(farm: FarmWorld) {
  const machine = await freshMachine(farm);
  await asManager(farm, 'PUT', {
    path: `/organizations/${farm.org.id}/machines/${machine.id}/photo`,
    file: { field: 'photo', name: 'tractor.png', type: 'image/png', content: PNG },
  });
  return machine;
}

export async function freshPlan(farm: FarmWorld, machine: Machine = farm.machine) {
  const plan = await asManager(farm, 'POST', {
    path: `/organizations/${farm.org.id}/machines/${machine.id}/service-records`,
    body: { status: 'planned', plannedFor: inDays(2), taskIds: [] },
  });
  return plan.data.id;
}

export async function freshDefect(farm: FarmWorld, machine: Machine = farm.machine) {
  const defect = await asManager(farm, 'POST', {
    path: `/organizations/${farm.org.id}/machines/${machine.id}/defects`,
    body: { title: `Loose step ${next()}`, severity: 'minor' },
  });
  return defect.data.id;
}

export async function freshAttachment(farm: FarmWorld) {
  const attachment = await asManager(farm, 'POST', {
    path: `/organizations/${farm.org.id}/service-records/${farm.completedId}/attachments`,
    file: { field: 'file', name: 'invoice.png', type: 'image/png', content: PNG },
  });
  return attachment.data.id;
}

export async function freshChecklistTemplate(farm: FarmWorld, category: string) {
  const template = await asManager(farm, 'POST', {
    path: `/organizations/${farm.org.id}/checklist-templates`,
    body: { category, name: `Daily check ${next()}`, items: [{ label: 'Lights' }] },
  });
  return template.data.id;
}

export async function freshMember(farm: FarmWorld) {
  return (await createMember(farm.org, 'operator')).membership.id;
}

export async function freshInvitation(org: Organization) {
  const { token, hash } = newToken();
  const invitation = await Invitation.create({
    organizationId: org.id,
    email: `invitee${next()}@test.example`,
    name: 'Invited Person',
    role: 'operator',
    tokenHash: hash,
    invitedBy: null,
    expiresAt: new Date(Date.now() + 7 * 86_400_000),
    acceptedAt: null,
  });
  return { id: invitation.id, token };
}

/** A reset link of a person of its own (a reset ends the sessions of whoever it resets). */
export async function freshResetToken() {
  const user = await createUser();
  const { token, hash } = newToken();
  await PasswordReset.create({
    userId: user.id,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + 3_600_000),
    usedAt: null,
  });
  return token;
}

/** A personal calendar feed of the person behind the cookie (or the farm's, as its manager). */
export async function freshFeed(farm: FarmWorld, cookie: string, scope: 'personal' | 'farm') {
  const res = await send('POST', cookie, {
    path: `/organizations/${farm.org.id}/calendar-feeds`,
    body: { scope },
  });
  if (res.status !== 201) throw new Error(`setup feed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.data.id as string;
}

/** A new dealer with an active link to the farm, for changing or revoking it. */
export async function freshDealerLink(farm: FarmWorld) {
  const dealer = await createOrganization({ name: `Test Dealer ${next()}`, kind: 'dealer' });
  const { user } = await createMember(dealer, 'advisor');
  const link = await linkDealer(dealer, farm.org, 'view');
  return { link, dealer, advisor: user };
}

/** A new dealer's service advisor, linked to nobody yet. */
export async function freshAdvisor() {
  const dealer = await createOrganization({ name: `Test Dealer ${next()}`, kind: 'dealer' });
  return (await createMember(dealer, 'advisor')).user;
}

/** A new dealer asking for access, its request's token in hand. */
export async function freshRequest() {
  const dealer = await createOrganization({
    name: `Test Dealer ${next()}`,
    kind: 'dealer',
    timeZone: TZ,
  });
  const { user } = await createMember(dealer, 'advisor');
  return pendingRequest(dealer, user);
}
