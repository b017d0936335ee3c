// The one seeded world the matrix runs against: the farm (its manager, technician and two
// operators), another farm whose manager is the stranger, and four dealers — linked to the farm
// with `view`, with `service`, one whose link was revoked, and one linked only to the other farm.
// Each farm holds one record of every kind, so every route has an own id and a foreign one.
import {
  MeterReading,
  Notification,
  type Machine,
  type Organization,
  type ServiceTask,
  type User,
} from '../../../server/models';
import { createMember, createOrganization, createTask } from '../../support/factories';
import { linkDealer } from '../dealer-fixture';
import type { Caller } from './callers';
import { sessionCookie } from './harness';
import {
  LAST_METER,
  PNG,
  TZ,
  asManager,
  assign,
  inDays,
  machineWithReadings,
  pendingRequest,
  proposal,
  today,
  walkaroundBody,
} from './seed-kit';

export interface FarmWorld {
  org: Organization;
  manager: User;
  managerCookie: string;
  /** in service, assigned to the farm's operator (the other farm: to nobody) */
  machine: Machine;
  /** assigned to the farm's second operator */
  othersMachine: Machine;
  /** tagged out (no defect open), to return to service */
  taggedOut: Machine;
  task: ServiceTask;
  /** on `machine`, its last service not known */
  unknownTask: ServiceTask;
  /** the machine's first reading (1,000 h, 32 days ago) */
  readingId: string;
  planId: string;
  completedId: string;
  attachmentId: string;
  defectId: string;
  walkaroundId: string;
  walkaroundPhotoId: string;
  checklistTemplateId: string;
  scheduleTemplateId: string;
  /** a membership no caller holds, to change and remove */
  memberId: string;
  invitationId: string;
  notificationId: string;
  farmFeedId: string;
  /** a dealer's proposal waiting for this farm */
  bookingId: string;
  /** an active dealer link of this farm (the farm: the view link) */
  linkId: string;
}

export interface World {
  farm: FarmWorld;
  other: FarmWorld;
  /** the dealer organization each advisor works for; otherDealer is linked to the other farm */
  dealers: Record<'viewDealer' | 'serviceDealer' | 'unlinkedDealer' | 'otherDealer', Organization>;
  users: Record<Exclude<Caller, 'anonymous'>, User>;
  cookies: Record<Caller, string | null>;
  /** the other dealer's request for access, a foreign id on the dealer's side */
  otherDealerRequestId: string;
}

async function seedFarm(name: string, prefix: string): Promise<FarmWorld> {
  const org = await createOrganization({ name, timeZone: TZ });
  const { user: manager } = await createMember(org, 'manager');
  const managerCookie = await sessionCookie(manager);
  const machine = await machineWithReadings(org, `${prefix}-01`);
  const othersMachine = await machineWithReadings(org, `${prefix}-02`);
  const task = await createTask(machine, {
    name: 'Engine oil and filter',
    lastDoneMeter: LAST_METER - 200,
    lastDoneOn: inDays(-30),
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
  });
  const unknownTask = await createTask(machine, {
    name: 'Coolant',
    intervalDays: 730,
    historyUnknown: true,
  });
  const taggedOut = await machineWithReadings(org, `${prefix}-03`);
  await taggedOut.update({ status: 'tagged_out' });
  const farm = { org, manager, managerCookie, machine, othersMachine, taggedOut } as FarmWorld;
  Object.assign(farm, { task, unknownTask });
  const base = `/organizations/${org.id}`;
  const onMachine = `${base}/machines/${machine.id}`;
  farm.readingId = (await MeterReading.findOne({
    where: { machineId: machine.id },
    order: [['takenAt', 'ASC']],
  }))!.id;
  const plan = await asManager(farm, 'POST', {
    path: `${onMachine}/service-records`,
    body: { status: 'planned', plannedFor: inDays(3), taskIds: [task.id] },
  });
  farm.planId = plan.data.id;
  // the visit fixed a defect: a service link reading the record must not learn its title
  const fixed = await asManager(farm, 'POST', {
    path: `${onMachine}/defects`,
    body: { title: 'Seat belt buckle sticks', severity: 'major' },
  });
  const completed = await asManager(farm, 'POST', {
    path: `${onMachine}/service-records`,
    body: {
      status: 'completed',
      performedOn: today(),
      meterValue: LAST_METER,
      taskIds: [task.id],
      measurements: [{ name: 'Brake lining', value: 4.2, unit: 'mm', specMin: 3, specMax: 6 }],
      closesDefectIds: [fixed.data.id],
    },
  });
  farm.completedId = completed.data.id;
  const attachment = await asManager(farm, 'POST', {
    path: `${base}/service-records/${farm.completedId}/attachments`,
    file: { field: 'file', name: 'worn-lining.png', type: 'image/png', content: PNG },
  });
  farm.attachmentId = attachment.data.id;
  await asManager(farm, 'PUT', {
    path: `${onMachine}/photo`,
    file: { field: 'photo', name: 'tractor.png', type: 'image/png', content: PNG },
  });
  const defect = await asManager(farm, 'POST', {
    path: `${onMachine}/defects`,
    body: { title: 'Cracked mirror glass', severity: 'minor' },
  });
  farm.defectId = defect.data.id;
  const photo = await asManager(farm, 'POST', {
    path: `${onMachine}/walkaround-photos`,
    file: { field: 'photo', name: 'mirror.png', type: 'image/png', content: PNG },
  });
  farm.walkaroundPhotoId = photo.data.id;
  const template = await asManager(farm, 'POST', {
    path: `${base}/checklist-templates`,
    body: { category: 'tractor', name: 'Tractor daily check', items: [{ label: 'Tyres' }] },
  });
  farm.checklistTemplateId = template.data.id;
  const walkaround = await asManager(farm, 'POST', {
    path: `${base}/walkarounds`,
    body: walkaroundBody(machine, [{ itemId: 'tyres', photoId: farm.walkaroundPhotoId }]),
  });
  farm.walkaroundId = walkaround.data.id;
  const schedule = await asManager(farm, 'POST', {
    path: `${base}/schedule-templates`,
    body: {
      category: 'tractor',
      name: 'Tractor basics',
      tasks: [{ name: 'Grease points', intervalMeter: 50 }],
    },
  });
  farm.scheduleTemplateId = schedule.data.id;
  farm.memberId = (await createMember(org, 'operator')).membership.id;
  const invitation = await asManager(farm, 'POST', {
    path: `${base}/invitations`,
    body: {
      email: `invited.${prefix.toLowerCase()}@test.example`,
      name: 'Invited Person',
      role: 'operator',
    },
  });
  farm.invitationId = invitation.data.id;
  farm.notificationId = (await Notification.findOne({ where: { organizationId: org.id } }))!.id;
  const feed = await asManager(farm, 'POST', {
    path: `${base}/calendar-feeds`,
    body: { scope: 'farm' },
  });
  farm.farmFeedId = feed.data.id;
  return farm;
}

async function dealerWithAdvisor(name: string) {
  const org = await createOrganization({ name, kind: 'dealer', timeZone: TZ });
  const { user } = await createMember(org, 'advisor');
  return { org, user };
}

export async function seedWorld(): Promise<World> {
  const farm = await seedFarm('Test Farm F', 'F');
  const other = await seedFarm('Test Farm G', 'G');
  const { user: technician } = await createMember(farm.org, 'technician');
  const { user: operator } = await createMember(farm.org, 'operator');
  const { user: secondOperator } = await createMember(farm.org, 'operator');
  await assign(farm.machine, operator);
  await assign(farm.othersMachine, secondOperator);
  const view = await dealerWithAdvisor('Test View Dealer');
  const service = await dealerWithAdvisor('Test Service Dealer');
  const unlinked = await dealerWithAdvisor('Test Unlinked Dealer');
  const otherDealer = await dealerWithAdvisor('Test Other Dealer');
  farm.linkId = (await linkDealer(view.org, farm.org, 'view')).id;
  await linkDealer(service.org, farm.org, 'service');
  await linkDealer(unlinked.org, farm.org, 'service', 'revoked');
  other.linkId = (await linkDealer(otherDealer.org, other.org, 'service')).id;
  farm.bookingId = await proposal(farm, service.org, service.user);
  other.bookingId = await proposal(other, otherDealer.org, otherDealer.user);
  const users = {
    manager: farm.manager,
    technician,
    operator,
    viewDealer: view.user,
    serviceDealer: service.user,
    unlinkedDealer: unlinked.user,
    stranger: other.manager,
  };
  const cookies: World['cookies'] = {
    anonymous: null,
    manager: farm.managerCookie,
    stranger: other.managerCookie,
    technician: await sessionCookie(technician),
    operator: await sessionCookie(operator),
    viewDealer: await sessionCookie(view.user),
    serviceDealer: await sessionCookie(service.user),
    unlinkedDealer: await sessionCookie(unlinked.user),
  };
  return {
    farm,
    other,
    dealers: {
      viewDealer: view.org,
      serviceDealer: service.org,
      unlinkedDealer: unlinked.org,
      otherDealer: otherDealer.org,
    },
    users,
    cookies,
    otherDealerRequestId: (await pendingRequest(otherDealer.org, otherDealer.user)).id,
  };
}
