// What is hitched, said in a walkaround (issue 13): recorded at the walkaround's own time, after
// its reading, so a span opened there counts the tractor's hours from the walkaround's figure; an
// implement whose hours come from the hitch log is asked no reading, says which tractor it is on,
// and Log hours says so too. Figures hand-worked here (linear interpolation between readings,
// shared/domain/hitch-hours.ts, is common practice).
import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const HOUR = 3_600_000;
const at = (msAgo: number) => new Date(Math.floor((Date.now() - msAgo) / 1000) * 1000);

async function farm() {
  const org = await createOrganization({ timeZone: 'UTC' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const tractor = await createMachine(org, { fleetNumber: 'T-01', category: 'tractor' });
  const other = await createMachine(org, { fleetNumber: 'T-02', category: 'tractor' });
  const mower = await createMachine(org, { fleetNumber: 'M-01', category: 'mower' });
  await addReadings(tractor, [{ daysAgo: 2, value: 1000 }]);
  await addReadings(other, [{ daysAgo: 2, value: 500 }]);
  const url = (rest: string) => `/api/v1/organizations/${org.id}${rest}`;
  /** a walkaround of the machine, every item of its checklist ok */
  const walk = async (machineId: string, extra: Record<string, unknown>) => {
    const list = await agent.get(url(`/machines/${machineId}/checklist`));
    expect(list.status).toBe(200);
    const items = (list.body.data.items as { id: string }[]).map((i) => ({
      itemId: i.id,
      result: 'ok',
    }));
    return agent
      .post(url('/walkarounds'))
      .send({ machineId, clientId: randomUUID(), items, ...extra });
  };
  const log = async (machineId: string) =>
    (await agent.get(url(`/machines/${machineId}/hitch-spans`))).body.data as {
      spans: { startedAt: string; endedAt: string | null; tractor: { id: string } }[];
      hitchHours: number;
    };
  return { org, agent, tractor, other, mower, url, walk, log };
}

beforeEach(resetDatabase);

describe('walkaround hitch — recorded at the walkaround’s time', () => {
  it('hand-worked — T-01 read 1,000 h two days ago; a walkaround a day ago says 1,008 h and M-01 on: the span starts at the walkaround, and T-01 at 1,014 h gives M-01 6 h', async () => {
    const { agent, tractor, mower, url, walk, log } = await farm();
    const performedAt = at(24 * HOUR);
    const res = await walk(tractor.id, {
      meterValue: 1008,
      performedAt: performedAt.toISOString(),
      hitch: { machineId: mower.id },
    });
    expect(res.status).toBe(201);
    const spans = (await log(mower.id)).spans;
    expect(spans).toHaveLength(1);
    expect(Date.parse(spans[0].startedAt)).toBe(performedAt.getTime());
    // nothing has run since it went on: the span starts on the walkaround's own 1,008 h
    expect((await log(mower.id)).hitchHours).toBeCloseTo(0, 6);
    const later = await agent
      .post(url(`/machines/${tractor.id}/readings`))
      .send({ value: 1014, takenAt: at(HOUR).toISOString() });
    expect(later.status).toBe(201);
    // 1,014 − 1,008 = 6 h. A span begun half an hour before the walkaround's reading would also
    // take its share of the 8 h before it, spread over the day: 6 + 8 × 0.5/24 ≈ 6.17 h.
    expect((await log(mower.id)).hitchHours).toBeCloseTo(6, 6);
  });

  it('“nothing hitched” at a later walkaround — the span ends at that walkaround, on its reading', async () => {
    const { tractor, mower, walk, log } = await farm();
    await walk(tractor.id, {
      meterValue: 1008,
      performedAt: at(24 * HOUR).toISOString(),
      hitch: { machineId: mower.id },
    });
    const offAt = at(2 * HOUR);
    const off = await walk(tractor.id, {
      meterValue: 1017,
      performedAt: offAt.toISOString(),
      hitch: { machineId: null },
    });
    expect(off.status).toBe(201);
    const { spans, hitchHours } = await log(mower.id);
    expect(Date.parse(spans[0].endedAt!)).toBe(offAt.getTime());
    expect(hitchHours).toBeCloseTo(9, 6); // 1,017 − 1,008
  });

  it('an implement on another tractor — 409 on the field hitch, in the clash’s words; no walkaround, no reading, no span', async () => {
    const { agent, tractor, other, mower, url, walk } = await farm();
    expect(
      (
        await agent
          .post(url('/hitch-spans'))
          .send({ implementId: mower.id, tractorId: other.id, startedAt: at(30 * HOUR) })
      ).status,
    ).toBe(201);
    const before = await countRows('meter_readings');
    const res = await walk(tractor.id, { meterValue: 1008, hitch: { machineId: mower.id } });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.hitch).toMatch(/M-01 is on T-02 from .* and still hitched/);
    expect(await countRows('walkarounds')).toBe(0);
    expect(await countRows('hitch_spans')).toBe(1);
    expect(await countRows('meter_readings')).toBe(before);
  });

  it('a tractor’s walkaround without its hour meter — 400 naming meterValue', async () => {
    const { tractor, walk } = await farm();
    const res = await walk(tractor.id, {});
    expect(res.status).toBe(400);
    expect(res.body.error.fields.meterValue).toMatch(/Enter the meter/);
    expect(await countRows('walkarounds')).toBe(0);
  });
});

describe('an implement whose hours come from the hitch log', () => {
  it('asks no reading: its checklist and Log hours name its tractor; a walkaround without a meter is kept at its hitch hours; a typed one is refused', async () => {
    const { agent, tractor, other, mower, url, walk, log } = await farm();
    // T-01 reads 1,004 h a day ago, M-01 goes on then, T-01 reads 1,016 h: M-01 has 12 h
    const onAt = at(24 * HOUR).toISOString();
    await agent.post(url(`/machines/${tractor.id}/readings`)).send({ value: 1004, takenAt: onAt });
    await agent
      .post(url('/hitch-spans'))
      .send({ implementId: mower.id, tractorId: tractor.id, startedAt: onAt });
    await agent
      .post(url(`/machines/${tractor.id}/readings`))
      .send({ value: 1016, takenAt: at(3 * HOUR).toISOString() });
    const checklist = await agent.get(url(`/machines/${mower.id}/checklist`));
    expect(checklist.body.data.machine.hitch).toMatchObject({
      tractor: { id: tractor.id, fleetNumber: 'T-01' },
      hours: 12,
    });
    const tractorList = await agent.get(url(`/machines/${tractor.id}/checklist`));
    expect(tractorList.body.data.machine.hitch).toBeNull();
    const latest = (await agent.get(url('/readings/latest'))).body.data as {
      machine: { id: string };
      hitch: { tractor: { fleetNumber: string } | null } | null;
    }[];
    expect(latest.find((l) => l.machine.id === mower.id)!.hitch?.tractor?.fleetNumber).toBe('T-01');
    expect(latest.find((l) => l.machine.id === tractor.id)!.hitch).toBeNull();

    const typed = await walk(mower.id, { meterValue: 12 });
    expect(typed.status).toBe(400);
    expect(typed.body.error.fields.meterValue).toMatch(/M-01 has no meter of its own/);

    // it says it is on T-02 now: off T-01 and on T-02 at the walkaround's time
    const movedAt = at(HOUR);
    const res = await walk(mower.id, {
      performedAt: movedAt.toISOString(),
      hitch: { machineId: other.id },
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ meterValue: 12, readingId: null });
    const { spans } = await log(mower.id);
    const byStart = [...spans].sort((a, b) => a.startedAt.localeCompare(b.startedAt));
    expect(Date.parse(byStart[0].endedAt!)).toBe(movedAt.getTime());
    expect(byStart[1]).toMatchObject({ tractor: { id: other.id }, endedAt: null });
    expect(Date.parse(byStart[1].startedAt)).toBe(movedAt.getTime());
  });
});
