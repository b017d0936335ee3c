// An implement's hours from the hitch log reach its due points (issue 13): the hitch readings a
// span writes, a tractor's reading while hitched moving the implement on in the same request, a
// correction of the tractor's reading or of the span working the hours out again, and a tractor
// that pulls nothing keeping its reading post as it was.
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { MeterReading } from '../../server/models';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const DAY = 86_400_000;
const daysAgo = (d: number, now: number) => new Date(now - d * DAY).toISOString();

// Hand-worked (the arithmetic is the test's own; linear interpolation between readings is common
// practice): tractor T-02 read 1,000 h ten days ago and 1,050 h five days ago (10 h a day). The
// mower is hitched from eight days ago: v(8 days ago) = 1,000 + 2/5 × 50 = 1,020 h. Open, it
// runs to the tractor's last reading: 1,050 − 1,020 = 30 h. A reading of 1,100 h now brings it
// to 1,100 − 1,020 = 80 h. Its task, every 50 h from 0 h, falls due at 50 h: 20 h left, then
// 30 h over.
async function hitchedMower() {
  const now = Date.now();
  const org = await createOrganization({ timeZone: 'UTC' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const tractor = await createMachine(org, { fleetNumber: 'T-02', category: 'tractor' });
  const mower = await createMachine(org, { fleetNumber: 'M-01', category: 'mower' });
  await addReadings(
    tractor,
    [
      { daysAgo: 10, value: 1000 },
      { daysAgo: 5, value: 1050 },
    ],
    new Date(now),
  );
  await createTask(mower, {
    name: 'Knife sections',
    intervalMeter: 50,
    lastDoneMeter: 0,
    warnMeter: 10,
  });
  const url = (rest: string) => `/api/v1/organizations/${org.id}${rest}`;
  const span = await agent
    .post(url('/hitch-spans'))
    .send({ implementId: mower.id, tractorId: tractor.id, startedAt: daysAgo(8, now) });
  expect(span.status).toBe(201);
  const due = async () => (await agent.get(url(`/machines/${mower.id}/due`))).body.data[0].due;
  const hitchReadings = async () =>
    (
      await MeterReading.findAll({
        where: { machineId: mower.id, source: 'hitch' },
        order: [['takenAt', 'ASC']],
      })
    ).map((r) => r.value);
  return { now, org, agent, tractor, mower, url, span: span.body.data, due, hitchReadings };
}

describe('hitch hours — through the API to the due point', () => {
  beforeEach(resetDatabase);

  it('open span — 30 h from hitching (1,050 − 1,020), one hitch reading at the tractor reading, task 20 h from due', async () => {
    const f = await hitchedMower();
    expect(f.span.hours).toBe(30);
    expect(await f.hitchReadings()).toEqual([30]);
    const log = await f.agent.get(f.url(`/machines/${f.mower.id}/hitch-spans`));
    expect(log.body.data.hitchHours).toBe(30);
    const due = await f.due();
    expect(due.dueMeter).toBe(50);
    expect(due.remainingMeter).toBe(20);
  });

  it('a tractor reading while hitched — the mower reaches 80 h in the same request and its task is overdue by 30 h', async () => {
    const f = await hitchedMower();
    const posted = await f.agent
      .post(f.url(`/machines/${f.tractor.id}/readings`))
      .send({ value: 1100 });
    expect(posted.status).toBe(201);
    expect(await f.hitchReadings()).toEqual([30, 80]);
    const due = await f.due();
    expect(due.status).toBe('overdue');
    expect(due.remainingMeter).toBe(-30);
  });

  it('unhitched between readings, then the tractor read again — the end edge is interpolated: 2 days ago between 1,050 (5 days) and 1,110 (now) → 1,086 − 1,020 = 66 h', async () => {
    const f = await hitchedMower();
    const ended = await f.agent
      .post(f.url(`/hitch-spans/${f.span.id}/end`))
      .send({ endedAt: daysAgo(2, f.now) });
    expect(ended.status).toBe(200);
    // before the tractor is read again the end holds its last value: 1,050 − 1,020 = 30 h
    expect(ended.body.data.hours).toBe(30);
    // a reading after the end moves the end's value: 1,050 + 3/5 × 60 = 1,086 (± the seconds between the test's clock and the post)
    await f.agent.post(f.url(`/machines/${f.tractor.id}/readings`)).send({ value: 1110 });
    const values = await f.hitchReadings();
    expect(values[0]).toBe(30);
    expect(values[1]).toBeCloseTo(66, 1);
    expect(values).toHaveLength(2);
  });

  it("a correction of the tractor's reading — 1,050 → 1,040: v(8 days ago) = 1,016, the mower 24 h", async () => {
    const f = await hitchedMower();
    const reading = await MeterReading.findOne({ where: { machineId: f.tractor.id, value: 1050 } });
    const res = await f.agent.patch(f.url(`/readings/${reading!.id}`)).send({ value: 1040 });
    expect(res.status).toBe(200);
    expect(await f.hitchReadings()).toEqual([24]);
    expect((await f.due()).remainingMeter).toBe(26);
  });

  it('a correction of the span — hitched from nine days ago instead: v = 1,000 + 1/5 × 50 = 1,010, the mower 40 h; removed: 0 h, no hitch readings', async () => {
    const f = await hitchedMower();
    const moved = await f.agent
      .patch(f.url(`/hitch-spans/${f.span.id}`))
      .send({ startedAt: daysAgo(9, f.now) });
    expect(moved.status).toBe(200);
    expect(moved.body.data.hours).toBe(40);
    expect(await f.hitchReadings()).toEqual([40]);
    expect((await f.agent.delete(f.url(`/hitch-spans/${f.span.id}`))).status).toBe(204);
    expect(await f.hitchReadings()).toEqual([]);
    expect((await f.due()).remainingMeter).toBeNull();
  });
});
