import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { todayIso, addDaysIso } from '../../shared/domain';

const app = createApp();

describe('due list API', () => {
  beforeEach(resetDatabase);

  it('due — 401 without sign-in; 404 for another farm', async () => {
    const org = await createOrganization();
    expect((await request(app).get(`/api/v1/organizations/${org.id}/due`)).status).toBe(401);
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(`/api/v1/organizations/${org.id}/due`)).status).toBe(404);
  });

  it('due — overdue first, then by the date each task falls due; counts by status; hand-worked figures', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const { user } = await createMember(org, 'manager');
    const a = await createMachine(org, { fleetNumber: 'A' });
    const b = await createMachine(org, { fleetNumber: 'B' });
    // 10 h/day for 30 days on both machines (hand-worked: rate 10 h/day, current 1,300 h)
    const pts = [0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 }));
    await addReadings(a, pts);
    await addReadings(b, pts);
    await createTask(a, {
      name: 'Late oil',
      intervalMeter: 250,
      lastDoneMeter: 1000,
      warnMeter: 25,
    }); // due 1,250: 50 h over
    await createTask(b, {
      name: 'Filter in 10 days',
      intervalMeter: 500,
      lastDoneMeter: 900,
      warnMeter: 50,
    }); // due 1,400: 100 h left
    await createTask(a, {
      name: 'Coolant',
      intervalMeter: 3000,
      lastDoneMeter: 1000,
      warnMeter: 300,
    }); // due 4,000: 270 days
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(res.status).toBe(200);
    const today = todayIso('America/Chicago');
    expect(res.body.meta.asOf).toBe(today);
    expect(
      res.body.data.map((r: { taskName: string; due: { status: string } }) => [
        r.taskName,
        r.due.status,
      ]),
    ).toEqual([
      ['Late oil', 'overdue'],
      ['Filter in 10 days', 'ok'],
      ['Coolant', 'ok'],
    ]);
    const filter = res.body.data[1];
    expect(filter.due.dueMeter).toBe(1400);
    expect(filter.due.remainingMeter).toBe(100);
    expect(filter.usage.rate).toBeCloseTo(10, 1);
    // 100 h at 10 h/day from the last reading (taken now) → 10 days ahead (±1 for the time of day)
    const projected = filter.due.projectedDate as string;
    expect([addDaysIso(today, 9), addDaysIso(today, 10), addDaysIso(today, 11)]).toContain(
      projected,
    );
    expect(res.body.meta.counts).toEqual({
      overdue: 1,
      due_soon: 0,
      history_unknown: 0,
      ok: 2,
      no_forecast: 0,
    });
  });

  it('due — horizon filter keeps overdue and what falls due inside it; status and category filters', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const a = await createMachine(org, { fleetNumber: 'A', category: 'tractor' });
    const b = await createMachine(org, { fleetNumber: 'B', category: 'baler', meterUnit: 'bales' });
    const pts = [0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 }));
    await addReadings(a, pts);
    await addReadings(b, pts);
    await createTask(a, { name: 'Late', intervalMeter: 250, lastDoneMeter: 1000 });
    await createTask(a, { name: 'Far', intervalMeter: 3000, lastDoneMeter: 1000 });
    await createTask(b, { name: 'Soon', intervalMeter: 500, lastDoneMeter: 900 });
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/due`;
    const h30 = await agent.get(`${url}?horizon=30`);
    expect(h30.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Late', 'Soon']);
    const balers = await agent.get(`${url}?category=baler`);
    expect(balers.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Soon']);
    const overdue = await agent.get(`${url}?status=overdue`);
    expect(overdue.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Late']);
    const bad = await agent.get(`${url}?horizon=12`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.horizon).toMatch(/7, 30, 90/);
  });

  it('due — stale meters: a machine in season with no reading for 14 days is listed', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const month = Number(todayIso(org.timeZone).slice(5, 7));
    const stale = await createMachine(org, { fleetNumber: 'S', seasonMonths: [month] });
    const offSeason = await createMachine(org, {
      fleetNumber: 'O',
      seasonMonths: [(month % 12) + 1],
    });
    const fresh = await createMachine(org, { fleetNumber: 'F' });
    await addReadings(stale, [
      { daysAgo: 40, value: 10 },
      { daysAgo: 20, value: 20 },
    ]);
    await addReadings(offSeason, [{ daysAgo: 40, value: 10 }]);
    await addReadings(fresh, [{ daysAgo: 2, value: 10 }]);
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(
      res.body.meta.stale.map((s: { machine: { fleetNumber: string } }) => s.machine.fleetNumber),
    ).toEqual(['S']);
    expect(res.body.meta.stale[0].daysSince).toBeGreaterThanOrEqual(19);
  });

  it('due — a machine with one reading has "no forecast" for a meter-only task', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const m = await createMachine(org);
    await addReadings(m, [{ daysAgo: 1, value: 100 }]);
    await createTask(m, { intervalMeter: 250, lastDoneMeter: 0 });
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/machines/${m.id}/due`);
    expect(res.status).toBe(200);
    expect(res.body.data[0].due.status).toBe('no_forecast');
    expect(res.body.data[0].due.projectedDate).toBeNull();
  });
});
