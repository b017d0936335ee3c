import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createMachine, createOrganization, createTask } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import { handWorkedFarm } from './reminders-fixture';
import { APP_URL, listHeaders, mailFor, NOW, runDigest, sendAll } from './due-digest-fixture';

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
