// A farm whose every record is filled in through the API, every optional field given and set
// away from its default (a km meter, a tagged-out machine, season months, assigned operators…),
// plus a dealer with an active link and a proposed booking. The PATCH round-trip and the fuzz
// tests start from it: a field that an edit wipes or resets shows as a changed column.
import type { Express } from 'express';
import type { Agent } from 'supertest';
import { DealerLink } from '../../server/models';
import { todayIso } from '../../shared/domain';
import { createMember, createOrganization, signedInAgent } from './factories';
import { resetDatabase } from './db';

const TZ = 'America/Chicago';
const DAY = 86_400_000;
const daysFromToday = (n: number) => todayIso(TZ, new Date(Date.now() + n * DAY));

export interface PopulatedWorld {
  farmId: string;
  dealerId: string;
  manager: Agent;
  advisor: Agent;
  ids: {
    machineId: string;
    taskId: string;
    otherTaskId: string;
    readingId: string;
    recordId: string;
    defectId: string;
    /** the checklist template (checklist-templates/:templateId) */
    templateId: string;
    /** a schedule template (apply-template's templateId) */
    scheduleTemplateId: string;
    linkId: string;
    bookingId: string;
    /** the technician's membership (members/:id) */
    membershipId: string;
    managerUserId: string;
    technicianUserId: string;
    operatorUserId: string;
    /** the farm's API key (api-keys/:keyId) */
    apiKeyId: string;
    /** the machine's second meter, PTO hours (meters/:meterId) */
    meterId: string;
    /** a closed hitch span of a trailed implement on the machine (hitch-spans/:spanId) */
    spanId: string;
    /** a second tractor in hours with a PTO meter (a span's tractor corrected onto it) */
    spareTractorId: string;
  };
  emails: { advisor: string; technician: string };
  checklistItemIds: string[];
  /** the farm's API key (the telematics routes take it) and its machine's serial number */
  apiKey: string;
  serialNumber: string;
}

async function send(agent: Agent, method: 'post' | 'patch' | 'put', url: string, body: object) {
  const res = await agent[method](`/api/v1${url}`).send(body);
  if (res.status >= 300)
    throw new Error(`world set-up: ${method} ${url} → ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.data;
}

/** Empties the database and builds the populated world. */
export async function buildPopulatedWorld(app: Express): Promise<PopulatedWorld> {
  await resetDatabase();
  const farm = await createOrganization({ name: 'Ridgeback Farm', timeZone: TZ });
  const { user: manager } = await createMember(farm, 'manager');
  const { user: tech, membership } = await createMember(farm, 'technician');
  const { user: op } = await createMember(farm, 'operator');
  const dealer = await createOrganization({ name: 'Vale Machinery', kind: 'dealer', timeZone: TZ });
  const { user: advisorUser } = await createMember(dealer, 'advisor');
  const link = await DealerLink.create({
    dealerOrganizationId: dealer.id,
    farmOrganizationId: farm.id,
    access: 'service',
    status: 'active',
    initiatedBy: 'farm',
    invitedBy: manager.id,
    tokenHash: null,
    expiresAt: null,
    acceptedBy: manager.id,
    acceptedAt: new Date(),
    revokedBy: null,
    revokedAt: null,
  });
  const agent = await signedInAgent(app, manager);
  const advisor = await signedInAgent(app, advisorUser);
  const org = `/organizations/${farm.id}`;

  const machine = await send(agent, 'post', `${org}/machines`, {
    fleetNumber: 'T-07',
    name: 'Row-crop tractor',
    category: 'tractor',
    make: 'Brindle',
    model: 'RX 190',
    serialNumber: 'BR190-00417',
    year: 2018,
    purchasePriceMinor: 18_250_050,
    listPriceMinor: 21_400_000,
    meterUnit: 'km',
    status: 'in_service',
    seasonMonths: [3, 4, 5, 9, 10],
    operatorIds: [op.id],
    notes: 'Front weights kept in the shed.\nCab filter changed at 4,100 km.',
  });
  const m = `${org}/machines/${machine.id}`;
  await send(agent, 'post', `${m}/readings`, {
    value: 4100,
    takenAt: new Date(Date.now() - 20 * DAY).toISOString(),
  });
  const reading = await send(agent, 'post', `${m}/readings`, {
    value: 4350,
    takenAt: new Date(Date.now() - 10 * DAY).toISOString(),
  });
  const fullTask = {
    name: 'Engine oil and filter',
    intervalMeter: 5000,
    intervalDays: 365,
    firstServiceMeter: 500,
    warnMeter: 250,
    warnDays: 21,
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L' }],
    labourHours: 1.5,
    instructions: 'Warm the engine first.\nDrain with the machine level.',
    safetyNotes: 'Hot oil: gloves and eye protection.',
    hazards: ['hot_fluid'],
  };
  const meter = await send(agent, 'post', `${m}/meters`, { kind: 'pto_hours' });
  // a trailed implement without a meter of its own, three days on a tractor's engine hours;
  // two tractors in hours with a PTO meter each (a span's tractor and meter can be corrected)
  const tractorInHours = async (fleetNumber: string) => {
    const t = await send(agent, 'post', `${org}/machines`, {
      fleetNumber,
      name: 'Utility tractor',
      category: 'tractor',
    });
    await send(agent, 'post', `${org}/machines/${t.id}/meters`, { kind: 'pto_hours' });
    return t.id as string;
  };
  const hitchTractorId = await tractorInHours('T-09');
  const spareTractorId = await tractorInHours('T-10');
  const implement = await send(agent, 'post', `${org}/machines`, {
    fleetNumber: 'M-07',
    name: 'Trailed mower',
    category: 'implement',
  });
  const span = await send(agent, 'post', `${org}/hitch-spans`, {
    implementId: implement.id,
    tractorId: hitchTractorId,
    meterKind: 'engine_hours',
    startedAt: new Date(Date.now() - 15 * DAY).toISOString(),
    endedAt: new Date(Date.now() - 12 * DAY).toISOString(),
    note: 'Second cut.',
  });
  const task = await send(agent, 'post', `${m}/tasks`, fullTask);
  await send(agent, 'put', `${org}/tasks/${task.id}/last-done`, {
    lastDoneMeter: 4000,
    lastDoneOn: daysFromToday(-30),
  });
  const otherTask = await send(agent, 'post', `${m}/tasks`, {
    ...fullTask,
    name: 'Hydraulic filters',
    hazards: ['hydraulic_pressure'],
  });
  // a spec sheet with every section filled (the tasks' own lines stand: none is changed)
  await send(agent, 'patch', `${m}/spec-sheet`, {
    capacities: { engineOil: { quantity: 18, unit: 'L', spec: 'SAE 15W-40' } },
    extraCapacities: [{ name: 'Front PTO gearbox', quantity: 1.2, unit: 'L' }],
    filters: { engineOil: 'OF-100' },
    extraFilters: [{ name: 'Hydraulic breather', partNumber: 'HB-2' }],
    tyrePressures: { front: { value: 160, unit: 'kPa' } },
    torques: [{ name: 'Wheel nuts', value: 650, unit: 'Nm' }],
    testPressures: [{ name: 'PTO clutch pressure', min: 2000, max: 2200, unit: 'kPa' }],
    notes: "From the operator's manual.",
  });
  const defect = await send(agent, 'post', `${m}/defects`, {
    title: 'Left work light flickers',
    description: 'Loose connector behind the cab pillar.',
    severity: 'minor',
  });
  await send(agent, 'patch', `${org}/defects/${defect.id}`, {
    assignedTo: tech.id,
    status: 'in_repair',
  });
  const record = await send(agent, 'post', `${m}/service-records`, {
    status: 'planned',
    plannedFor: daysFromToday(7),
    taskIds: [task.id],
    technicianIds: [tech.id],
    labourHours: 2.5,
    // costs in minor units (cents) of the farm's currency
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1, unitCostMinor: 1840 }],
    fluids: [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L', unitCostMinor: 610 }],
    otherCosts: [{ description: 'Shop towels', amountMinor: 400 }],
    notes: 'Bring the long drain hose.',
    measurements: [{ name: 'Oil pressure', value: 3.4, unit: 'bar', specMin: 2.5, specMax: 4.5 }],
    reassemblySettings: [{ what: 'Belt tensioner', value: '3 turns out', restored: false }],
    unrestoredReason: 'Tensioner on order',
    closesDefectIds: [defect.id],
  });
  const template = await send(agent, 'post', `${org}/checklist-templates`, {
    category: 'tractor',
    name: 'Tractor daily check',
    description: 'Before the first run of the day.',
    items: [
      {
        label: 'Engine oil level',
        guidance: 'Between the marks',
        critical: false,
        hazards: [],
        caution: '',
      },
      {
        label: 'PTO guard in place',
        guidance: 'No cracks',
        critical: true,
        hazards: ['pto'],
        caution: 'Engine off before touching the shaft.',
      },
    ],
  });
  const scheduleTemplate = await send(agent, 'post', `${org}/schedule-templates`, {
    category: 'tractor',
    name: 'Row-crop tractor schedule',
    description: 'From the operator manual, section 9.',
    tasks: [fullTask],
  });
  const booking = await send(advisor, 'post', `/organizations/${dealer.id}/bookings`, {
    customerId: farm.id,
    proposedFor: daysFromToday(14),
    items: [{ machineId: machine.id, taskIds: [task.id] }],
    note: 'We can bring the filters.',
  });
  await send(agent, 'patch', `${org}/reminder-settings`, { digestHour: 7 });
  // a critical defect tags the machine out: an edit must leave it so
  await send(agent, 'post', `${m}/defects`, {
    title: 'Brake pedal travel excessive',
    description: 'Pedal reaches the floor on the left brake.',
    severity: 'critical',
  });

  const key = await send(agent, 'post', `/organizations/${farm.id}/api-keys`, {
    name: 'World feed',
  });
  return {
    apiKey: key.secret,
    serialNumber: machine.serialNumber,
    farmId: farm.id,
    dealerId: dealer.id,
    manager: agent,
    advisor,
    ids: {
      machineId: machine.id,
      taskId: task.id,
      otherTaskId: otherTask.id,
      readingId: reading.id,
      recordId: record.id,
      defectId: defect.id,
      templateId: template.id,
      scheduleTemplateId: scheduleTemplate.id,
      linkId: link.id,
      bookingId: booking.id,
      membershipId: membership.id,
      managerUserId: manager.id,
      technicianUserId: tech.id,
      operatorUserId: op.id,
      apiKeyId: key.id,
      meterId: meter.id,
      spanId: span.id,
      spareTractorId,
    },
    emails: { advisor: advisorUser.email, technician: tech.email },
    checklistItemIds: (template.items as { id: string }[]).map((item) => item.id),
  };
}
