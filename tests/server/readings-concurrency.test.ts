import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { MeterReading } from '../../server/models';

const app = createApp();

beforeEach(async () => {
  await resetDatabase();
});

const storedValues = async (machineId: string) =>
  (await MeterReading.findAll({ where: { machineId }, order: [['takenAt', 'ASC']] })).map((r) =>
    Number(r.value),
  );

describe('reading edits at the same moment', () => {
  it('two corrections in parallel that are each fine alone but clash together — one is stored, the other refused (422); the meter never goes backwards', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    await addReadings(machine, [
      { daysAgo: 10, value: 100 },
      { daysAgo: 5, value: 150 },
      { daysAgo: 1, value: 200 },
    ]);
    const [, middle, last] = await MeterReading.findAll({
      where: { machineId: machine.id },
      order: [['takenAt', 'ASC']],
    });
    const first = await signedInAgent(app, user);
    const second = await signedInAgent(app, user);
    const url = (id: string) => `/api/v1/organizations/${org.id}/readings/${id}`;
    // 190 fits between 100 and 200; 160 fits between 150 and today; both together would put
    // 190 before 160
    const answers = await Promise.all([
      first.patch(url(middle.id)).send({ value: 190 }),
      second.patch(url(last.id)).send({ value: 160 }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 422]);
    const values = await storedValues(machine.id);
    expect(values[0]).toBe(100);
    expect([
      [100, 190, 200],
      [100, 150, 160],
    ]).toContainEqual(values);
  });

  it('a correction and a deletion of the same reading in parallel — never a 500; the stored readings are one outcome or the other', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    await addReadings(machine, [
      { daysAgo: 10, value: 100 },
      { daysAgo: 5, value: 150 },
      { daysAgo: 1, value: 200 },
    ]);
    const [, middle] = await MeterReading.findAll({
      where: { machineId: machine.id },
      order: [['takenAt', 'ASC']],
    });
    const first = await signedInAgent(app, user);
    const second = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/readings/${middle.id}`;
    const [corrected, deleted] = await Promise.all([
      first.patch(url).send({ value: 160 }),
      second.delete(url),
    ]);
    expect(deleted.status).toBe(204);
    // the correction either ran first (200, then deleted) or found the reading gone (404)
    expect([200, 404]).toContain(corrected.status);
    expect(await storedValues(machine.id)).toEqual([100, 200]);
  });
});
