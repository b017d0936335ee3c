import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import { createMember, createMachine, createOrganization, createTask } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting, type CaughtMail } from '../support/mail';
import * as dueDigest from '../../jobs/due-digest';
import * as deliverMail from '../../jobs/deliver-mail';
import { MachineOperator, Notification, NotificationPreference } from '../../server/models';
import { localClock, setDigestHour } from '../../server/services/reminders';
import { handWorkedFarm } from './reminders-fixture';

const app = createApp();
const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:4310';
// Tuesday 7 April 2026, 08:00 in Chicago (CDT, UTC−5): past the default digest hour (6).
const NOW = new Date('2026-04-07T13:00:00Z');
/** One run of the job (it returns null only when another worker holds its lock). */
const runDigest = async (now: Date) => (await dueDigest.perform(now))!;
const hours = (n: number) => new Date(NOW.getTime() + n * 3_600_000);

const mailFor = (all: CaughtMail[], email: string) =>
  all.filter((m) => m.to.some((t) => t.toLowerCase().includes(email.toLowerCase())));

const sendAll = () => deliverMail.perform();

/** The List-* headers as the mail catcher's parser reports them (merged into one `list`). */
function listHeaders(mail: CaughtMail) {
  return JSON.parse(mail.headers.list) as {
    unsubscribe: { url: string };
    'unsubscribe-post': { name: string };
  };
}

// Provenance: derived — the due list is worked by hand in reminders-fixture.ts (steady use of
// 10 h/day, the trend method of CHECKS.md §3); the digest must carry exactly those figures.
describe('due digest — content (hand-worked due list, see reminders-fixture.ts)', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('digest — lists overdue, due soon and what the forecast brings due within 14 days, per machine, with links; HTML and text; RFC 8058 headers', async () => {
    const org = await createOrganization({ name: 'Test Farm', timeZone: 'America/Chicago' });
    const { user } = await createMember(org, 'manager', { name: 'Ann Manager' });
    const { asOf, tractor, baler, loader } = await handWorkedFarm(org, NOW);
    expect(asOf).toBe('2026-04-07');

    expect(await runDigest(NOW)).toEqual({ organizations: 1, queued: 1 });
    expect((await sendAll()).sent).toBe(1);
    const [mail] = mailFor(await caughtMail(), user.email);
    expect(mail.subject).toBe('Due list: Test Farm — 1 overdue, 2 due soon, 2 coming up');

    const text = mail.text;
    // per machine, most pressing first: T-01 (overdue oil) before B-02
    expect(text.indexOf('T-01 · North tractor')).toBeGreaterThan(-1);
    expect(text.indexOf('T-01 · North tractor')).toBeLessThan(text.indexOf('B-02 · Round baler'));
    expect(text).toContain(`${APP_URL}/o/${org.id}/machines/${tractor.id}`);
    expect(text).toContain(`${APP_URL}/o/${org.id}/machines/${baler.id}`);
    expect(text).toContain('Overdue: Engine oil and filter');
    expect(text).toContain('Due at 1,250 h — 50 h over');
    expect(text).toContain('Overdue: 50 h over');
    expect(text).toContain('Caution: hot fluids (see Cautions below).');
    expect(text).toContain('Due soon: Air filter');
    expect(text).toContain('Due at 1,350 h — 50 h left');
    expect(text).toContain('Coming up: Fuel filters');
    expect(text).toContain('Due at 1,400 h — 100 h left');
    // 100 h at 10 h/day from a reading taken now (08:00) → 10.33 days on: Friday 17 April
    expect(text).toContain('Projected Fri, Apr 17, 2026');
    expect(text).toContain('Due soon: Knotter grease');
    // done 25 days before 7 April (13 March) + 30 days → Sunday 12 April
    expect(text).toContain('Calendar limit Sun, Apr 12, 2026');
    // 270 days away: not in a 14-day digest
    expect(text).not.toContain('Coolant');
    // The loader's uneven use gives a range (derived, worked by hand; trend method of
    // shared/domain/usage.ts). Readings 500, 580, 680, 800 h at 30, 20, 10, 0 days ago, all at
    // 08:00 CDT, so the last one lies at asOf + 8/24 = asOf + 0.333.
    // - Interval rates 8, 10, 12 h/day, weighted 10 days × 2^(−age of the middle / 21):
    //   2^(−25/21) = 0.438, 2^(−15/21) = 0.610, 2^(−5/21) = 0.848 (total 1.896). The 20th
    //   percentile (0.379) falls in the first → low 8 h/day; the 80th (1.516) in the third → 12.
    // - Point rate: least squares with weights 2^(−age/21) = 0.371, 0.517, 0.719, 1 on
    //   (0, 0), (10, 80), (20, 180), (30, 300): x̄ = 19.004, ȳ = 180.56, Sxy = 3,055.4,
    //   Sxx = 297.66 → 10.265 h/day.
    // 50 h to go: earliest 0.333 + 50/12 = 4.50 → asOf + 4 (Sat 11 Apr); point 0.333 + 50/10.265
    // = 5.20 → asOf + 5 (Sun 12 Apr); latest 0.333 + 50/8 = 6.58 → asOf + 6 (Mon 13 Apr).
    expect(text).toContain(`${APP_URL}/o/${org.id}/machines/${loader.id}`);
    expect(text).toContain('Coming up: Grease pins');
    expect(text).toContain('Projected Sun, Apr 12, 2026 (range Sat, Apr 11 – Mon, Apr 13, 2026)');

    expect(mail.html).toContain('name="viewport"');
    expect(mail.html).toContain(`href="${APP_URL}/o/${org.id}/machines/${tractor.id}"`);
    expect(mail.html).toContain('Engine oil and filter');

    const list = listHeaders(mail);
    expect(list.unsubscribe.url).toMatch(new RegExp(`^${APP_URL}/api/v1/unsubscribe/[^>]+$`));
    expect(list['unsubscribe-post'].name).toBe('List-Unsubscribe=One-Click');
    expect(text).toContain(`Stop these e-mails: ${list.unsubscribe.url}`);
  });

  // The cautions are the one hazard table's (shared/domain/hazards.ts), written out by hand here.
  it('digest — tasks with hazards — each task names its hazards; a Cautions section gives each hazard once in full, then the deferral; text and HTML', async () => {
    const org = await createOrganization({ name: 'Test Farm', timeZone: 'America/Chicago' });
    const { user } = await createMember(org, 'manager', { name: 'Ann Manager' });
    const { tractor } = await handWorkedFarm(org, NOW);
    await createTask(tractor, {
      name: 'PTO shaft grease',
      intervalMeter: 250,
      lastDoneMeter: 1000,
      warnMeter: 25,
      hazards: ['pto', 'hot_fluid'],
    });
    await runDigest(NOW);
    await sendAll();
    const [mail] = mailFor(await caughtMail(), user.email);
    const hot =
      'Hot fluids: Drain oil warm, not hot: stop the engine and let it stand until the oil is warm, not hot, so it still flows but cannot scald; wear gloves and eye protection and keep out of the stream. Open a radiator or coolant cap, or drain coolant, only once the system is cold.';
    const pto =
      'PTO shaft: Stop the engine, take the key and wait for the shaft to stop before you go near the PTO, couple or uncouple a shaft or clear a blockage: a 540 rpm shaft turns 9 times a second, faster than anyone can pull free. Never step over a turning shaft; keep its guards in place and loose clothing and hair away.';
    const deferral =
      "Follow the operator's manual, local regulations and qualified service practice.";

    const text = mail.text;
    expect(text).toContain('Overdue: Engine oil and filter');
    expect(text).toContain('Caution: hot fluids (see Cautions below).');
    expect(text).toContain('Caution: PTO shaft and hot fluids (see Cautions below).');
    // each once, in the table's order (PTO before hot fluids), then the deferral
    expect(text).toContain(`Cautions\n${pto}\n${hot}\n${deferral}`);
    expect(text.split('Drain oil warm, not hot').length - 1).toBe(1);
    expect(text).not.toMatch(/let it cool/i);

    const html = mail.html;
    expect(html).toContain('>Cautions</h2>');
    expect(html).toContain(`>${hot}</p>`);
    expect(html).toContain(`>${pto}</p>`);
    expect(html).toContain(`>${deferral.replace("'", '&#39;')}</p>`);
  });

  it('digest — nothing due: no e-mail at all', async () => {
    const org = await createOrganization();
    await createMember(org, 'manager');
    const m = await createMachine(org);
    await createTask(m, { intervalMeter: null, intervalDays: 365, lastDoneOn: '2026-04-01' });
    expect((await runDigest(NOW)).queued).toBe(0);
  });
});

describe('due digest — each person’s preferences', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('preferences — default daily for managers and technicians, off for operators; weekly on the chosen weekday; machine and category filters; off', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const { tractor, baler } = await handWorkedFarm(org, NOW);
    const manager = await createMember(org, 'manager');
    const technician = await createMember(org, 'technician');
    const operator = await createMember(org, 'operator');
    const optedIn = await createMember(org, 'operator');
    const weeklyTuesday = await createMember(org, 'technician');
    const weeklyMonday = await createMember(org, 'technician');
    const balersOnly = await createMember(org, 'manager');
    const tractorOnly = await createMember(org, 'manager');
    const off = await createMember(org, 'manager');
    const pref = (m: { membership: { id: string } }, p: Partial<NotificationPreference>) =>
      NotificationPreference.create({
        membershipId: m.membership.id,
        organizationId: org.id,
        frequency: 'daily',
        ...p,
      });
    await pref(optedIn, { frequency: 'daily' });
    await pref(weeklyTuesday, { frequency: 'weekly', weekday: 2 });
    await pref(weeklyMonday, { frequency: 'weekly', weekday: 1 });
    await pref(balersOnly, { categories: ['baler'] });
    await pref(tractorOnly, { machineIds: [tractor.id] });
    await pref(off, { frequency: 'off' });
    // the opted-in operator runs the baler; the tractor is someone else's
    await MachineOperator.create({
      organizationId: org.id,
      machineId: baler.id,
      userId: optedIn.user.id,
    });
    await MachineOperator.create({
      organizationId: org.id,
      machineId: tractor.id,
      userId: operator.user.id,
    });

    expect(localClock(org.timeZone, NOW).isoWeekday).toBe(2); // a Tuesday
    await dueDigest.perform(NOW);
    await sendAll();
    const all = await caughtMail();
    const got = (m: { user: { email: string } }) => mailFor(all, m.user.email);

    expect(got(manager)).toHaveLength(1);
    expect(got(technician)).toHaveLength(1);
    expect(got(operator)).toHaveLength(0);
    expect(got(off)).toHaveLength(0);
    expect(got(weeklyMonday)).toHaveLength(0);
    expect(got(weeklyTuesday)).toHaveLength(1);
    expect(got(weeklyTuesday)[0].subject).toMatch(/^Weekly due list/);

    const [opMail] = got(optedIn);
    expect(opMail.text).toContain('Knotter grease');
    expect(opMail.text).not.toContain('T-01');
    const [balerMail] = got(balersOnly);
    expect(balerMail.text).toContain('B-02');
    expect(balerMail.text).not.toContain('T-01');
    const [tractorMail] = got(tractorOnly);
    expect(tractorMail.text).toContain('T-01');
    expect(tractorMail.text).not.toContain('B-02');

    const periods = await Notification.findAll({ where: { kind: 'due_digest' } });
    expect(new Set(periods.map((p) => p.periodKey))).toEqual(
      new Set(['daily:2026-04-07', 'weekly:2026-W15']),
    );
  });

  it('preferences — the one-click unsubscribe (POST to the List-Unsubscribe address) turns the digest off for the next day', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user, membership } = await createMember(org, 'manager');
    await dueDigest.perform(NOW);
    await sendAll();
    const [mail] = mailFor(await caughtMail(), user.email);
    const url = new URL(listHeaders(mail).unsubscribe.url);
    const res = await request(app)
      .post(url.pathname)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect((await NotificationPreference.findByPk(membership.id))!.frequency).toBe('off');
    await clearMail();
    expect((await runDigest(hours(24))).queued).toBe(0);
  });
});

describe('due digest — once per day, whatever runs', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });
  afterEach(() => setMailAccepting(true));

  it('two runs on one day send one message; the next day sends the next one', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    expect((await runDigest(NOW)).queued).toBe(1);
    expect((await runDigest(NOW)).queued).toBe(0);
    expect((await runDigest(hours(3))).queued).toBe(0);
    await sendAll();
    await sendAll();
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect((await runDigest(hours(24))).queued).toBe(1);
  });

  it('two workers started together send one message (advisory lock + unique outbox key)', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    const [a, b] = await Promise.all([dueDigest.perform(NOW), dueDigest.perform(NOW)]);
    // the second either skipped on the lock (null) or found the message queued already
    expect((a?.queued ?? 0) + (b?.queued ?? 0)).toBe(1);
    const [s1, s2] = await Promise.all([deliverMail.perform(), deliverMail.perform()]);
    expect(s1.sent + s2.sent).toBe(1);
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect(await Notification.count({ where: { kind: 'due_digest' } })).toBe(1);
  });

  it('SMTP down then up: the digest waits in the outbox, is retried and arrives once', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    await setMailAccepting(false);
    await dueDigest.perform(NOW);
    expect(await sendAll()).toEqual({ sent: 0, failed: 0, retrying: 1 });
    expect((await runDigest(hours(1))).queued).toBe(0); // a later run adds nothing
    const row = (await Notification.findOne({ where: { kind: 'due_digest' } }))!;
    expect(row.status).toBe('queued');
    expect(row.lastError).toBeTruthy();
    await setMailAccepting(true);
    await row.update({ nextAttemptAt: new Date() }); // the backoff has passed
    expect((await sendAll()).sent).toBe(1);
    expect((await sendAll()).sent).toBe(0);
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect((await row.reload()).status).toBe('sent');
  });
});

describe('due digest — the farm’s time zone decides the local hour (DST changes included)', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('local clock — Europe/Dublin on the first day of summer time (29 Mar 2026, Sunday, ISO week 13)', () => {
    expect(localClock('Europe/Dublin', new Date('2026-03-29T05:30:00Z'))).toEqual({
      date: '2026-03-29',
      hour: 6, // IST = UTC+1 since 01:00 UTC
      month: 3,
      isoWeekday: 7,
      isoWeek: '2026-W13',
    });
    expect(localClock('America/Chicago', new Date('2026-03-08T07:30:00Z')).hour).toBe(1); // CST
    expect(localClock('America/Chicago', new Date('2026-03-08T08:30:00Z')).hour).toBe(3); // CDT
  });

  it('America/Chicago and Europe/Dublin at digest hour 6: the same UTC time sends before a DST change and not after, or the reverse', async () => {
    const chicago = await createOrganization({ timeZone: 'America/Chicago' });
    const dublin = await createOrganization({ timeZone: 'Europe/Dublin' });
    for (const org of [chicago, dublin]) {
      await setDigestHour(org.id, 6);
      await createMember(org, 'manager');
      const m = await createMachine(org);
      // calendar-only task, overdue all through March 2026
      await createTask(m, { intervalMeter: null, intervalDays: 30, lastDoneOn: '2026-01-01' });
    }
    const periods = async (orgId: string) =>
      (await Notification.findAll({ where: { organizationId: orgId, kind: 'due_digest' } }))
        .map((n) => n.periodKey)
        .sort();

    // Chicago: 11:30 UTC is 05:30 CST on 7 March — before the hour
    await dueDigest.perform(new Date('2026-03-07T11:30:00Z'));
    expect(await periods(chicago.id)).toEqual([]);
    // 12:30 UTC is 06:30 CST — sent for 7 March
    await dueDigest.perform(new Date('2026-03-07T12:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07']);
    // 05:30 UTC on 8 March is still 23:30 on 7 March in Chicago: nothing new
    await dueDigest.perform(new Date('2026-03-08T05:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07']);
    // after the change to CDT (UTC−5), 11:30 UTC is 06:30: sent for 8 March
    await dueDigest.perform(new Date('2026-03-08T11:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07', 'daily:2026-03-08']);

    // Dublin: 05:30 UTC is 05:30 GMT on 28 March — before the hour
    await dueDigest.perform(new Date('2026-03-28T05:30:00Z'));
    expect((await periods(dublin.id)).includes('daily:2026-03-28')).toBe(false);
    // on 29 March (IST, UTC+1) the same 05:30 UTC is 06:30: sent
    await dueDigest.perform(new Date('2026-03-29T05:30:00Z'));
    expect((await periods(dublin.id)).includes('daily:2026-03-29')).toBe(true);
    // Dublin's 7 March digest went out at 11:30 UTC (already 11:30 there)
    expect((await periods(dublin.id)).includes('daily:2026-03-07')).toBe(true);
  });

  it('a later digest hour set by the manager holds the digest back until then', async () => {
    const org = await createOrganization({ timeZone: 'Europe/Dublin' });
    await setDigestHour(org.id, 9);
    await createMember(org, 'manager');
    const m = await createMachine(org);
    await createTask(m, { intervalMeter: null, intervalDays: 30, lastDoneOn: '2026-01-01' });
    // 07:30 UTC on 10 March = 07:30 GMT
    expect((await runDigest(new Date('2026-03-10T07:30:00Z'))).queued).toBe(0);
    expect((await runDigest(new Date('2026-03-10T09:00:00Z'))).queued).toBe(1);
  });
});
