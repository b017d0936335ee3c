// Several meters per machine (issue 13): readings, rules and forecasts per meter, a counter reset,
// and meter ids from elsewhere. Figures are hand-worked here; the lifetime rule is the project's
// own (shared/domain/lifetime.ts: raw + Σ(old final − new start) over earlier changes).
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createMeter,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { MeterReading } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();
const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const ago = (ms: number) => new Date(Date.now() - ms).toISOString();

beforeEach(resetDatabase);

async function farm(role: 'manager' | 'operator' = 'manager') {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(org, role);
  return { org, agent: await signedInAgent(app, user) };
}

describe('readings per meter', () => {
  it('rules per meter — a PTO reading far below the engine hours is accepted; below its own last one it is refused; a reading without meterId goes on the primary', async () => {
    const { org, agent } = await farm();
    const tractor = await createMachine(org, { fleetNumber: 'T-01' });
    const pto = await createMeter(tractor, 'pto_hours');
    await addReadings(tractor, [{ daysAgo: 2, value: 4200 }]);
    const url = `/api/v1/organizations/${org.id}/machines/${tractor.id}/readings`;
    const onPto = await agent.post(url).send({ value: 310, takenAt: ago(DAY), meterId: pto.id });
    expect(onPto.status).toBe(201);
    expect(onPto.body.data).toMatchObject({ meterId: pto.id, value: 310, lifetimeValue: 310 });
    const lower = await agent.post(url).send({ value: 300, takenAt: ago(HOUR), meterId: pto.id });
    expect(lower.status).toBe(422);
    expect(lower.body.error.fields.value).toMatch(/lower than the previous reading of 310 h/);
    // 25 h of PTO time in an hour: above the 24 h a day an hour meter can run (common practice)
    const fast = await agent.post(url).send({ value: 336, takenAt: ago(HOUR), meterId: pto.id });
    expect(fast.status).toBe(422);
    expect(fast.body.error.fields.value).toMatch(/24 h per day/);
    const plain = await agent.post(url).send({ value: 4210, takenAt: ago(HOUR) });
    expect(plain.status).toBe(201);
    expect(plain.body.data.meterId).not.toBe(pto.id);
    const history = await agent.get(`${url}?meterId=${pto.id}`);
    expect(history.body.data.map((r: { value: number }) => r.value)).toEqual([310]);
    // without meterId: the primary meter's, as before several meters
    const primary = await agent.get(url);
    expect(primary.body.data.map((r: { value: number }) => r.value)).toEqual([4210, 4200]);
  });

  it('forecast per meter — a separator task falls due by separator hours, an engine task by engine hours (hand-worked)', async () => {
    const { org, agent } = await farm();
    const combine = await createMachine(org, { fleetNumber: 'C-01', category: 'combine' });
    const separator = await createMeter(combine, 'separator_hours');
    // engine 10 h/day (1,000 → 1,300 h), separator 6 h/day (500 → 680 h) over 30 days
    await addReadings(combine, [
      ...[0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 })),
      ...[0, 10, 20, 30].map((d) => ({
        daysAgo: 30 - d,
        value: 500 + d * 6,
        meterId: separator.id,
      })),
    ]);
    await createTask(combine, {
      name: 'Separator drive belt',
      meterId: separator.id,
      intervalMeter: 250,
      lastDoneMeter: 500,
    }); // due at 750 separator hours: 70 h left at 6 h/day ≈ 11.7 days
    await createTask(combine, { name: 'Engine oil', intervalMeter: 250, lastDoneMeter: 1100 });
    // due at 1,350 engine hours: 50 h left at 10 h/day = 5 days
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(res.status).toBe(200);
    const row = (name: string) =>
      res.body.data.find((r: { taskName: string }) => r.taskName === name);
    const today = todayIso('America/Chicago');
    const belt = row('Separator drive belt');
    expect(belt.due).toMatchObject({ status: 'ok', dueMeter: 750, remainingMeter: 70 });
    expect(belt.usage.rate).toBeCloseTo(6, 1);
    expect(belt.lastReading.value).toBe(680);
    expect([11, 12, 13].map((d) => addDaysIso(today, d))).toContain(belt.due.projectedDate);
    const oil = row('Engine oil');
    expect(oil.due).toMatchObject({ dueMeter: 1350, remainingMeter: 50 });
    expect(oil.usage.rate).toBeCloseTo(10, 1);
    expect([4, 5, 6].map((d) => addDaysIso(today, d))).toContain(oil.due.projectedDate);
  });
});

describe('counter reset', () => {
  it('an operator records a reset; lifetime values run on across it; a plain lower reading is still refused and points at the reset', async () => {
    const { org, agent } = await farm('operator');
    const baler = await createMachine(org, {
      fleetNumber: 'B-01',
      category: 'baler',
      meterUnit: 'bales',
    });
    await addReadings(baler, [{ daysAgo: 3, value: 9800 }]);
    const base = `/api/v1/organizations/${org.id}/machines/${baler.id}`;
    expect(
      (await agent.post(`${base}/readings`).send({ value: 9950, takenAt: ago(2 * DAY) })).status,
    ).toBe(201);
    const lower = await agent.post(`${base}/readings`).send({ value: 40, takenAt: ago(HOUR) });
    expect(lower.status).toBe(422);
    expect(lower.body.error.fields.value).toMatch(/may not go backwards.*Counter was reset/);
    // a meter replacement stays with managers and technicians
    const replacement = await agent.post(`${base}/meter-replacements`).send({
      oldFinalValue: 9990,
      newStartValue: 0,
      replacedAt: ago(DAY),
    });
    expect(replacement.status).toBe(403);
    const reset = await agent
      .post(`${base}/meter-resets`)
      .send({ oldFinalValue: 9990, resetAt: ago(DAY) });
    expect(reset.status).toBe(201);
    expect(reset.body.data).toMatchObject({ kind: 'reset', oldFinalValue: 9990, newStartValue: 0 });
    const after = await agent.post(`${base}/readings`).send({ value: 40, takenAt: ago(HOUR) });
    expect(after.status).toBe(201);
    // 40 on the counter + (9,990 − 0) before the reset = 10,030 bales over the baler's life
    expect(after.body.data).toMatchObject({ value: 40, lifetimeValue: 10030 });
    const machine = await agent.get(base);
    expect(machine.body.data.lastReading).toMatchObject({ value: 40, lifetimeValue: 10030 });
    // below the counter's new start is still going backwards
    const again = await agent.post(`${base}/readings`).send({ value: 30, takenAt: ago(60_000) });
    expect(again.status).toBe(422);
    const history = await agent.get(`${base}/readings`);
    expect(history.body.replacements).toEqual([expect.objectContaining({ kind: 'reset' })]);
  });

  it('a reset before the last reading is refused naming replacedAt; bad input is 400 naming the field; nothing written', async () => {
    const { org, agent } = await farm();
    const baler = await createMachine(org, { meterUnit: 'bales', category: 'baler' });
    await addReadings(baler, [{ daysAgo: 1, value: 500 }]);
    const url = `/api/v1/organizations/${org.id}/machines/${baler.id}/meter-resets`;
    const early = await agent.post(url).send({ oldFinalValue: 480, resetAt: ago(2 * DAY) });
    expect(early.status).toBe(422);
    expect(early.body.error.fields.replacedAt).toMatch(/counter reset must come after/);
    const bad = await agent.post(url).send({ oldFinalValue: -1, resetAt: ago(HOUR) });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.oldFinalValue).toMatch(/may not be negative/);
    expect(await countRows('meter_replacements')).toBe(0);
    expect(await MeterReading.count()).toBe(1);
  });
});

describe('a counter reset belongs to counting meters (shared/domain/meter-kinds.ts)', () => {
  it('on the engine hours, the separator hours or a PTO meter — 400 naming meterId and the rule; nothing written', async () => {
    const { org, agent } = await farm();
    const combine = await createMachine(org, { category: 'combine' });
    const separator = await createMeter(combine, 'separator_hours');
    const pto = await createMeter(combine, 'pto_hours');
    await addReadings(combine, [{ daysAgo: 2, value: 1200 }]);
    const url = `/api/v1/organizations/${org.id}/machines/${combine.id}/meter-resets`;
    for (const meterId of [undefined, separator.id, pto.id]) {
      const res = await agent.post(url).send({ oldFinalValue: 1210, resetAt: ago(HOUR), meterId });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.meterId).toMatch(
        /only for a counting meter \(a bale counter\); (Engine|Separator|PTO) hours is not zeroed in use/,
      );
    }
    expect(await countRows('meter_replacements')).toBe(0);
    expect(await MeterReading.count()).toBe(1);
  });

  it('on a bale counter added to a tractor-drawn baler with an hour meter — accepted', async () => {
    const { org, agent } = await farm('operator');
    const baler = await createMachine(org, { category: 'baler' });
    const bales = await createMeter(baler, 'bales');
    const url = `/api/v1/organizations/${org.id}/machines/${baler.id}/meter-resets`;
    const res = await agent
      .post(url)
      .send({ oldFinalValue: 820, resetAt: ago(HOUR), meterId: bales.id });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ meterId: bales.id, kind: 'reset' });
  });
});

describe('meter replacement on any meter', () => {
  it('a new separator meter on a combine — its lifetime runs on; the engine hours are untouched (hand-worked)', async () => {
    const { org, agent } = await farm();
    const combine = await createMachine(org, { category: 'combine' });
    const separator = await createMeter(combine, 'separator_hours');
    await addReadings(combine, [
      { daysAgo: 3, value: 2400 },
      { daysAgo: 3, value: 900, meterId: separator.id },
    ]);
    const base = `/api/v1/organizations/${org.id}/machines/${combine.id}`;
    const replaced = await agent.post(`${base}/meter-replacements`).send({
      meterId: separator.id,
      oldFinalValue: 910,
      newStartValue: 0,
      replacedAt: ago(2 * DAY),
    });
    expect(replaced.status).toBe(201);
    expect(replaced.body.data).toMatchObject({ meterId: separator.id, kind: 'replacement' });
    const onSeparator = await agent
      .post(`${base}/readings`)
      .send({ value: 12, takenAt: ago(DAY), meterId: separator.id });
    expect(onSeparator.status).toBe(201);
    // 12 h on the new meter + (910 − 0) on the old one = 922 separator hours over its life
    expect(onSeparator.body.data).toMatchObject({ value: 12, lifetimeValue: 922 });
    // the engine meter has no replacement: a reading shows its own value as its lifetime
    const onEngine = await agent.post(`${base}/readings`).send({ value: 2410, takenAt: ago(DAY) });
    expect(onEngine.body.data).toMatchObject({ value: 2410, lifetimeValue: 2410 });
    const meters = (await agent.get(`${base}/meters`)).body.data as {
      kind: string;
      lastReading: { value: number; lifetimeValue: number };
    }[];
    expect(meters.find((m) => m.kind === 'separator_hours')!.lastReading).toMatchObject({
      value: 12,
      lifetimeValue: 922,
    });
    expect(meters.find((m) => m.kind === 'engine_hours')!.lastReading).toMatchObject({
      value: 2410,
      lifetimeValue: 2410,
    });
    const history = await agent.get(`${base}/readings`);
    expect(history.body.replacements).toEqual([]);
    const separatorHistory = await agent.get(`${base}/readings?meterId=${separator.id}`);
    expect(separatorHistory.body.replacements).toEqual([
      expect.objectContaining({ meterId: separator.id, oldFinalValue: 910 }),
    ]);
  });
});

describe('meter ids from elsewhere', () => {
  it('another farm’s meter, or another machine’s — 404 naming meterId on a reading, a reset and a task; nothing written', async () => {
    const { org, agent } = await farm();
    const mine = await createMachine(org);
    const sibling = await createMachine(org);
    const siblingMeter = await createMeter(sibling, 'pto_hours');
    const other = await createOrganization();
    const theirs = await createMeter(await createMachine(other), 'pto_hours');
    const base = `/api/v1/organizations/${org.id}/machines/${mine.id}`;
    for (const meterId of [theirs.id, siblingMeter.id]) {
      const reading = await agent
        .post(`${base}/readings`)
        .send({ value: 10, takenAt: ago(HOUR), meterId });
      expect(reading.status).toBe(404);
      expect(reading.body.error.fields.meterId).toBeDefined();
      const reset = await agent
        .post(`${base}/meter-resets`)
        .send({ oldFinalValue: 10, resetAt: ago(HOUR), meterId });
      expect(reset.status).toBe(404);
      const task = await agent
        .post(`${base}/tasks`)
        .send({ name: 'PTO check', intervalMeter: 100, meterId });
      expect(task.status).toBe(404);
      expect(task.body.error.fields.meterId).toBeDefined();
    }
    const bulk = await agent.post(`/api/v1/organizations/${org.id}/readings/bulk`).send({
      readings: [{ machineId: mine.id, value: 10, takenAt: ago(HOUR), meterId: theirs.id }],
    });
    expect(bulk.status).toBe(422);
    expect(bulk.body.error.fields['readings.0.meterId']).toMatch(/No such meter/);
    expect(await countRows('meter_readings')).toBe(0);
    expect(await countRows('meter_replacements')).toBe(0);
    expect(await countRows('service_tasks')).toBe(0);
  });
});
