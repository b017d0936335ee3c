// The farm the telematics API tests post to: a manager, three machines matched by serial number,
// PIN and telematics id, and an API key; the snapshot builders.
import request from 'supertest';
import { createApp } from '../../server/app';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

export const app = createApp();
export const SNAPSHOT = '/api/v1/telematics/iso15143-3';
export const H = 3_600_000;
export const ago = (ms: number) => new Date(Date.now() - ms).toISOString();

export async function farm() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const bySerial = await createMachine(org, { fleetNumber: 'T-02' });
  await bySerial.update({ serialNumber: 'TMS-RC210-19-4417' });
  const byPin = await createMachine(org, { fleetNumber: 'S-01' });
  await byPin.update({ serialNumber: 'TMS-SP-20-0001' });
  const byFeedId = await createMachine(org, { fleetNumber: 'C-01' });
  await byFeedId.update({ serialNumber: 'HRL-C-17-0003', telematicsId: 'feed-c01' });
  const made = await agent
    .post(`/api/v1/organizations/${org.id}/api-keys`)
    .send({ name: 'Yard feed' });
  return { org, agent, bySerial, byPin, byFeedId, key: made.body.data.secret as string };
}

export const entry = (header: Record<string, string>, hour?: number, at = ago(H)) => ({
  EquipmentHeader: { OEMName: 'Tamsin', Model: 'RC 210', ...header },
  ...(hour !== undefined && { CumulativeOperatingHours: { datetime: at, Hour: hour } }),
  Location: { Latitude: 41.5, Longitude: -93.6 },
});
export const send = (key: string, equipment: object[]) =>
  request(app)
    .post(SNAPSHOT)
    .set('Authorization', `Bearer ${key}`)
    .send({ Fleet: { version: '1', snapshotTime: ago(0), Links: [], Equipment: equipment } });
