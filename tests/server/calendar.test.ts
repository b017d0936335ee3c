import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import ICAL from 'ical.js';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { MachineOperator } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();
const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:4310';

/** Parses a feed with ical.js (the independent reference parser) into plain events. */
function parseFeed(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  return calendar.getAllSubcomponents('vevent').map((component) => {
    const event = new ICAL.Event(component);
    return {
      uid: event.uid,
      summary: event.summary,
      description: event.description,
      start: event.startDate.toString(),
      isDate: event.startDate.isDate,
      end: event.endDate.toString(),
    };
  });
}

const feedsUrl = (orgId: string) => `/api/v1/organizations/${orgId}/calendar-feeds`;
const feedPath = (url: string) => new URL(url).pathname;

async function farmWithTasks() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const manager = await createMember(org, 'manager');
  const tractor = await createMachine(org, { fleetNumber: 'T-01', name: 'North tractor' });
  // 10 h/day for 30 days, now at 1,300 h
  await addReadings(
    tractor,
    [30, 20, 10, 0].map((d) => ({ daysAgo: d, value: 1300 - d * 10 })),
  );
  const oil = await createTask(tractor, {
    name: 'Engine oil and filter',
    intervalMeter: 500,
    lastDoneMeter: 1000,
    warnMeter: 50,
  }); // due 1,500 h: 200 h to go → 20 days
  const baler = await createMachine(org, { fleetNumber: 'B-02', name: 'Round baler' });
  const grease = await createTask(baler, {
    name: 'Knotter grease',
    intervalMeter: null,
    intervalDays: 30,
    lastDoneOn: addDaysIso(todayIso(org.timeZone), -10),
  }); // calendar: 20 days from today
  return { org, manager, tractor, baler, oil, grease };
}

describe('calendar feeds — managing the links', () => {
  beforeEach(resetDatabase);

  it('feeds — 401 without sign-in', async () => {
    const org = await createOrganization();
    expect((await request(app).get(feedsUrl(org.id))).status).toBe(401);
    expect((await request(app).post(feedsUrl(org.id)).send({ scope: 'personal' })).status).toBe(
      401,
    );
    const id = '00000000-0000-4000-8000-000000000000';
    expect((await request(app).delete(`${feedsUrl(org.id)}/${id}`)).status).toBe(401);
  });

  it('feeds — 400 on a bad scope, nothing written', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const res = await agent.post(feedsUrl(org.id)).send({ scope: 'everyone' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.scope).toMatch(/personal or farm/);
    expect((await agent.delete(`${feedsUrl(org.id)}/not-an-id`)).status).toBe(400);
    expect(await countRows('calendar_feeds')).toBe(0);
  });

  it('feeds — 404 for another farm (list, create, revoke)', async () => {
    const { org, manager } = await farmWithTasks();
    const agent = await signedInAgent(app, manager.user);
    const created = await agent.post(feedsUrl(org.id)).send({ scope: 'farm' });
    const other = await createOrganization();
    const stranger = await createMember(other, 'manager');
    const them = await signedInAgent(app, stranger.user);
    expect((await them.get(feedsUrl(org.id))).status).toBe(404);
    expect((await them.post(feedsUrl(org.id)).send({ scope: 'farm' })).status).toBe(404);
    expect((await them.delete(`${feedsUrl(org.id)}/${created.body.data.id}`)).status).toBe(404);
    // nor through their own farm's path
    expect((await them.delete(`${feedsUrl(other.id)}/${created.body.data.id}`)).status).toBe(404);
  });

  it('feeds — 403: a technician may not share the farm feed; a dealer advisor has no feed', async () => {
    const org = await createOrganization();
    const tech = await createMember(org, 'technician');
    const agent = await signedInAgent(app, tech.user);
    expect((await agent.post(feedsUrl(org.id)).send({ scope: 'farm' })).status).toBe(403);
    const dealer = await createOrganization({ kind: 'dealer' });
    const advisor = await createMember(dealer, 'advisor');
    const adv = await signedInAgent(app, advisor.user);
    expect((await adv.get(feedsUrl(dealer.id))).status).toBe(403);
    expect((await adv.post(feedsUrl(dealer.id)).send({ scope: 'personal' })).status).toBe(403);
    expect(await countRows('calendar_feeds')).toBe(0);
  });

  it('feeds — 200/201: a manager creates the farm and a personal link; a technician sees only their own', async () => {
    const org = await createOrganization();
    const manager = await createMember(org, 'manager');
    const tech = await createMember(org, 'technician');
    const agent = await signedInAgent(app, manager.user);
    const farm = await agent.post(feedsUrl(org.id)).send({ scope: 'farm' });
    expect(farm.status).toBe(201);
    expect(farm.body.data).toMatchObject({ scope: 'farm' });
    expect(farm.body.data.url).toMatch(new RegExp(`^${APP_URL}/api/v1/calendar/[^/]+\\.ics$`));
    const mine = await agent.post(feedsUrl(org.id)).send({ scope: 'personal' });
    const list = await agent.get(feedsUrl(org.id));
    expect(list.status).toBe(200);
    expect(list.body.data.farm.url).toBe(farm.body.data.url);
    expect(list.body.data.personal.url).toBe(mine.body.data.url);
    const techAgent = await signedInAgent(app, tech.user);
    const techList = await techAgent.get(feedsUrl(org.id));
    expect(techList.body.data).toEqual({ personal: null, farm: null });
    // someone else's personal feed answers 404, not 403
    expect((await techAgent.delete(`${feedsUrl(org.id)}/${mine.body.data.id}`)).status).toBe(404);
    expect((await techAgent.delete(`${feedsUrl(org.id)}/${farm.body.data.id}`)).status).toBe(403);
  });
});

describe('calendar feed — the .ics (RFC 5545, parsed with ical.js)', () => {
  beforeEach(resetDatabase);

  it('feed — one all-day VEVENT per task on its effective date, stable UID, summary "T-01 · Task", description with due meter, range and link', async () => {
    const { org, manager, tractor, oil, grease } = await farmWithTasks();
    const agent = await signedInAgent(app, manager.user);
    const { url } = (await agent.post(feedsUrl(org.id)).send({ scope: 'farm' })).body.data;
    const res = await request(app).get(feedPath(url));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    const events = parseFeed(res.text);
    expect(events.map((e) => e.uid).sort()).toEqual(
      [`${oil.id}@hourstone`, `${grease.id}@hourstone`].sort(),
    );
    const today = todayIso(org.timeZone);
    const oilEvent = events.find((e) => e.uid === `${oil.id}@hourstone`)!;
    expect(oilEvent.summary).toBe('T-01 · Engine oil and filter');
    expect(oilEvent.isDate).toBe(true);
    // 200 h at 10 h/day → 20 days on (±1 for the time of day the readings were taken)
    expect([19, 20, 21].map((n) => addDaysIso(today, n))).toContain(oilEvent.start);
    expect(oilEvent.end).toBe(addDaysIso(oilEvent.start, 1));
    expect(oilEvent.description).toContain('Due at 1,500 h — 200 h left');
    expect(oilEvent.description).toContain('Projected');
    expect(oilEvent.description).toContain(`${APP_URL}/o/${org.id}/machines/${tractor.id}`);
    const greaseEvent = events.find((e) => e.uid === `${grease.id}@hourstone`)!;
    expect(greaseEvent.start).toBe(addDaysIso(today, 20));
    expect(greaseEvent.summary).toBe('B-02 · Knotter grease');
  });

  it('feed — a new reading moves the date; the UIDs stay the same (calendar apps update, not duplicate)', async () => {
    const { org, manager, tractor, oil } = await farmWithTasks();
    const agent = await signedInAgent(app, manager.user);
    const { url } = (await agent.post(feedsUrl(org.id)).send({ scope: 'farm' })).body.data;
    const before = parseFeed((await request(app).get(feedPath(url))).text);
    // 150 h more today: 50 h left at a faster rate → much sooner
    await addReadings(tractor, [{ daysAgo: 0, value: 1450 }], new Date(Date.now() + 60_000));
    const after = parseFeed((await request(app).get(feedPath(url))).text);
    expect(after.map((e) => e.uid).sort()).toEqual(before.map((e) => e.uid).sort());
    const moved = (list: typeof before) => list.find((e) => e.uid === `${oil.id}@hourstone`)!;
    expect(moved(after).start < moved(before).start).toBe(true);
  });

  it('feed — personal feed of an operator holds only the machines they see', async () => {
    const { org, tractor, baler, grease } = await farmWithTasks();
    const op = await createMember(org, 'operator');
    const someoneElse = await createMember(org, 'operator');
    await MachineOperator.create({
      organizationId: org.id,
      machineId: baler.id,
      userId: op.user.id,
    });
    await MachineOperator.create({
      organizationId: org.id,
      machineId: tractor.id,
      userId: someoneElse.user.id,
    });
    const agent = await signedInAgent(app, op.user);
    const { url } = (await agent.post(feedsUrl(org.id)).send({ scope: 'personal' })).body.data;
    const events = parseFeed((await request(app).get(feedPath(url))).text);
    expect(events.map((e) => e.uid)).toEqual([`${grease.id}@hourstone`]);
  });

  it('feed — 400 for a malformed address; 404 for an unknown one, after revocation, and for a replaced link', async () => {
    const { org, manager } = await farmWithTasks();
    expect((await request(app).get('/api/v1/calendar/not-a-token.ics')).status).toBe(400);
    const forged = `00000000-0000-0000-0000-000000000000.${'a'.repeat(43)}`;
    expect((await request(app).get(`/api/v1/calendar/${forged}.ics`)).status).toBe(404);
    const agent = await signedInAgent(app, manager.user);
    const first = (await agent.post(feedsUrl(org.id)).send({ scope: 'farm' })).body.data;
    const second = (await agent.post(feedsUrl(org.id)).send({ scope: 'farm' })).body.data;
    expect((await request(app).get(feedPath(first.url))).status).toBe(404);
    expect((await request(app).get(feedPath(second.url))).status).toBe(200);
    expect((await agent.delete(`${feedsUrl(org.id)}/${second.id}`)).status).toBe(204);
    expect((await request(app).get(feedPath(second.url))).status).toBe(404);
    expect((await agent.get(feedsUrl(org.id))).body.data.farm).toBeNull();
  });

  it('feed — a personal feed stops when its person leaves the farm', async () => {
    const { org } = await farmWithTasks();
    const tech = await createMember(org, 'technician');
    const agent = await signedInAgent(app, tech.user);
    const { url } = (await agent.post(feedsUrl(org.id)).send({ scope: 'personal' })).body.data;
    expect((await request(app).get(feedPath(url))).status).toBe(200);
    await tech.membership.destroy();
    expect((await request(app).get(feedPath(url))).status).toBe(404);
  });
});
