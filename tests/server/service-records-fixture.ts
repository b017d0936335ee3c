// The shop the service-record tests work in: T-01 with readings up to 1,190 h and three tasks,
// a technician signed in and an operator; `completed()` is a completed record's body at 1,200 h.
import { createApp } from '../../server/app';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { todayIso } from '../../shared/domain';

export const app = createApp();
export const TZ = 'America/Chicago';
const DAY = 86_400_000;
export const today = () => todayIso(TZ);
export const daysAgoIso = (n: number) => todayIso(TZ, new Date(Date.now() - n * DAY));

/** A farm with a technician, an operator, T-01 with readings up to 1,190 h and three tasks. */
export async function shop() {
  const org = await createOrganization({ timeZone: TZ });
  const { user: tech } = await createMember(org, 'technician');
  const { user: op } = await createMember(org, 'operator');
  const machine = await createMachine(org, { fleetNumber: 'T-01' });
  await addReadings(machine, [
    { daysAgo: 40, value: 1000 },
    { daysAgo: 20, value: 1100 },
    { daysAgo: 2, value: 1190 },
  ]);
  const oil = await createTask(machine, {
    name: 'Engine oil and filter',
    intervalMeter: 250,
    lastDoneMeter: 1000,
    lastDoneOn: daysAgoIso(40),
    labourHours: 1,
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L' }],
  });
  const hydraulic = await createTask(machine, {
    name: 'Hydraulic filters',
    intervalMeter: 500,
    lastDoneMeter: 900,
    lastDoneOn: daysAgoIso(60),
    labourHours: 0.75,
    parts: [
      { partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 },
      { partNumber: 'of-100', description: 'Oil filter', quantity: 1 },
    ],
  });
  const air = await createTask(machine, {
    name: 'Air filter inspection',
    intervalMeter: 250,
    lastDoneMeter: 1050,
    lastDoneOn: daysAgoIso(30),
    labourHours: 0.3,
  });
  const agent = await signedInAgent(app, tech);
  const base = `/api/v1/organizations/${org.id}`;
  return {
    org,
    tech,
    op,
    machine,
    oil,
    hydraulic,
    air,
    agent,
    base,
    records: `${base}/machines/${machine.id}/service-records`,
  };
}

export const completed = (extra: Record<string, unknown> = {}) => ({
  status: 'completed',
  performedOn: today(),
  meterValue: 1200,
  ...extra,
});
