// Demo-data checks of the demo's meters and hitch log (issue 13): the combine's separator hours,
// the tractors' PTO hours, the baler's counter reset and the rotary cutter that has no meter and
// takes its hours from the hitch log. They check that the invented demo is consistent with the
// server's own rules (the triggers of migration 0026, the hitch log's recompute), not the math.
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import {
  Machine,
  MachineForecast,
  MachineMeter,
  MeterReading,
  MeterReplacement,
  ServiceTask,
  TaskDuePoint,
} from '../../server/models';
import { HitchSpan } from '../../server/models/hitch-span';
import { recomputeHitchReadings } from '../../server/services/hitch-readings';
import { loadDemo } from '../../server/seeders/demo';
import { resetDatabase } from '../support/db';

const machine = (fleetNumber: string) =>
  Machine.findOne({ where: { fleetNumber }, rejectOnEmpty: true });
const meterOf = async (fleetNumber: string, kind: string) =>
  MachineMeter.findOne({
    where: { machineId: (await machine(fleetNumber)).id, kind },
    rejectOnEmpty: true,
  });
const readingsOf = (meterId: string) =>
  MeterReading.findAll({ where: { meterId }, order: [['takenAt', 'ASC']] });

describe('demo scenario — meters and hitch log', () => {
  const today = new Date();
  beforeAll(async () => {
    await resetDatabase();
    await loadDemo({ reset: true, today });
  });

  it.each([
    ['C-01', 'separator_hours'],
    ['T-02', 'pto_hours'],
    ['T-03', 'pto_hours'],
    ['T-11', 'pto_hours'],
  ])(
    'demo — %s has a %s meter beside its engine hours, read with them, never ahead of them',
    async (fleet, kind) => {
      const extra = await meterOf(fleet, kind);
      const engine = await meterOf(fleet, 'engine_hours');
      expect([extra.isPrimary, engine.isPrimary]).toEqual([false, true]);
      const [mine, engines] = [await readingsOf(extra.id), await readingsOf(engine.id)];
      expect(mine.length).toBeGreaterThan(40);
      const engineAt = new Map(engines.map((r) => [r.takenAt.getTime(), r.lifetimeValue]));
      for (let i = 1; i < mine.length; i += 1) {
        const [a, b] = [mine[i - 1], mine[i]];
        const engineRise = engineAt.get(b.takenAt.getTime())! - engineAt.get(a.takenAt.getTime())!;
        expect(b.lifetimeValue).toBeGreaterThanOrEqual(a.lifetimeValue);
        // one decimal either way of rounding
        expect(b.lifetimeValue - a.lifetimeValue).toBeLessThanOrEqual(engineRise + 0.11);
      }
      const forecast = await MachineForecast.findOne({ where: { meterId: extra.id } });
      expect(forecast?.lastValue).toBe(mine.at(-1)!.value);
    },
  );

  it('demo — the bale counter was zeroed once: shown values start again, lifetime runs on', async () => {
    const counter = await meterOf('B-01', 'bales');
    const changes = await MeterReplacement.findAll({ where: { meterId: counter.id } });
    expect(changes.map((c) => [c.kind, c.newStartValue])).toEqual([['reset', 0]]);
    const readings = await readingsOf(counter.id);
    const after = readings.filter((r) => r.takenAt >= changes[0].replacedAt);
    expect(after.length).toBeGreaterThan(10);
    for (const r of after) expect(r.lifetimeValue - r.value).toBe(changes[0].oldFinalValue);
    for (let i = 1; i < readings.length; i += 1)
      expect(readings[i].lifetimeValue).toBeGreaterThanOrEqual(readings[i - 1].lifetimeValue);
  });

  it('demo — B-01 walkaround after the reset — starts from what the counter shows, not the lifetime count', async () => {
    const baler = await machine('B-01');
    const counter = await meterOf('B-01', 'bales');
    const last = (await readingsOf(counter.id)).at(-1)!;
    expect(last.value).toBeLessThan(last.lifetimeValue);
    const agent = request.agent(createApp());
    await agent
      .post('/api/v1/auth/sign-in')
      .send({ email: 'lena@larkspur.example', password: 'hourstone-demo' })
      .expect(200);
    const res = await agent
      .get(`/api/v1/organizations/${baler.organizationId}/machines/${baler.id}/checklist`)
      .expect(200);
    expect(res.body.data.machine.lastReading.value).toBe(last.value);
  });

  it("demo — RC-01 has no meter: its hours are T-02's PTO hours over its spans, as the server works them out", async () => {
    const cutter = await machine('RC-01');
    const t02 = await machine('T-02');
    const spans = await HitchSpan.findAll({ where: { implementId: cutter.id } });
    expect(new Set(spans.map((s) => `${s.tractorId}/${s.meterKind}`))).toEqual(
      new Set([`${t02.id}/pto_hours`]),
    );
    expect(spans.filter((s) => s.endedAt === null)).toHaveLength(1);
    expect(spans.filter((s) => s.endedAt !== null).length).toBeGreaterThanOrEqual(4);
    const readings = await MeterReading.findAll({ where: { machineId: cutter.id } });
    expect(readings.length).toBeGreaterThan(10);
    expect(new Set(readings.map((r) => r.source))).toEqual(new Set(['hitch']));

    // the server's own recompute from the spans and T-02's readings finds nothing to change
    const change = await sequelize.transaction((transaction) =>
      recomputeHitchReadings(
        {
          organizationId: cutter.organizationId,
          timeZone: 'America/Chicago',
          userId: null,
          now: today,
        },
        cutter.id,
        transaction,
      ),
    );
    expect(change).toEqual({ added: 0, removed: 0 });
  });

  it("demo — RC-01's tasks fall due from its hitch hours", async () => {
    const cutter = await machine('RC-01');
    const task = await ServiceTask.findOne({
      where: { machineId: cutter.id, name: 'Wear parts: tines, points, discs and knives' },
      rejectOnEmpty: true,
    });
    const due = await TaskDuePoint.findOne({ where: { taskId: task.id }, rejectOnEmpty: true });
    const forecast = await MachineForecast.findOne({
      where: { machineId: cutter.id },
      rejectOnEmpty: true,
    });
    expect(forecast.lastValue).toBeGreaterThan(0);
    // 50 h interval (the service library's common practice) from the last done point
    expect(task.lastDoneMeter).toBeLessThanOrEqual(forecast.lastValue!);
    expect(due.due.dueMeter).toBe(task.lastDoneMeter! + 50);
  });
});
