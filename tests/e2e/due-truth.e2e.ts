// Issue 10 "What new users tripped on", the due truth in the browser: a task 38 h past its meter is
// overdue on the shop week (not under Today), on the dashboard's 7-day list and on the machine
// page, worded the same ("38 h over"); the count cards count the whole fleet at any horizon; a
// refusal after a meter replacement speaks in the meter fitted now. Writes only OD-01, its own.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, signIn, type TestBrowser } from './support/browser';
import { DUE_TRUTH_FLEET, larkspurFarm } from './support/demo-fleet';

const DESKTOP = { width: 1280, height: 800 };
const DAY = 86_400_000;

describe('due truth — overdue means overdue, in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let machineId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    org = (await larkspurFarm(page)).id;
    const created = await page.request.post(`/api/v1/organizations/${org}/machines`, {
      data: { fleetNumber: DUE_TRUTH_FLEET, name: 'Harl yard tractor', category: 'tractor' },
    });
    expect(created.status()).toBe(201);
    machineId = (await created.json()).data.id;
    // 10 h a day for 30 days: 1,000 h → 1,300 h
    for (const [daysAgo, value] of [
      [30, 1000],
      [20, 1100],
      [10, 1200],
      [0, 1300],
    ]) {
      const takenAt = new Date(Date.now() - daysAgo * DAY - 60_000).toISOString();
      const res = await page.request.post(
        `/api/v1/organizations/${org}/machines/${machineId}/readings`,
        { data: { value, takenAt } },
      );
      expect(res.status()).toBe(201);
    }
    // due at 1,262 h, read 1,300 h: 38 h over (a new task's last service is set on its own)
    const task = await page.request.post(
      `/api/v1/organizations/${org}/machines/${machineId}/tasks`,
      { data: { name: 'Gearbox oil', intervalMeter: 250 } },
    );
    expect(task.status()).toBe(201);
    const lastDoneOn = new Date(Date.now() - 29 * DAY).toISOString().slice(0, 10);
    const lastDone = await page.request.put(
      `/api/v1/organizations/${org}/tasks/${(await task.json()).data.id}/last-done`,
      { data: { lastDoneMeter: 1012, lastDoneOn } },
    );
    expect(lastDone.status()).toBe(200);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shop week — the task past its meter is under Overdue with how far, not under Today', async () => {
    await page.goto(`/o/${org}/shop`);
    await page.getByRole('heading', { name: 'Shop week', level: 1 }).waitFor();
    const item = page.getByRole('listitem').filter({ hasText: `${DUE_TRUTH_FLEET} · Gearbox oil` });
    await item.first().waitFor();
    expect(await item.count()).toBe(1);
    await item.getByText(/38 h over/).waitFor();
    // the day marked Today does not list it
    const today = page.getByRole('article').filter({ hasText: 'Today' });
    if (await today.count()) expect(await today.innerText()).not.toContain(DUE_TRUTH_FLEET);
  });

  it('dashboard — "Next 7 days" lists it as overdue; the count cards count the whole fleet', async () => {
    await page.goto(`/o/${org}?horizon=7`);
    await page
      .getByText(
        'Everything overdue and every task whose last service is not known, then what falls due within the next 7 days, by date. Tasks without a forecast yet come last.',
      )
      .waitFor();
    await page.getByRole('heading', { name: 'Every task of the fleet by status' }).waitFor();
    const ok = page
      .getByRole('list', { name: 'Task counts across the fleet' })
      .getByRole('button', { name: /^OK\b/ });
    expect(Number((await ok.innerText()).match(/\d+/)![0])).toBeGreaterThan(0);
    const row = page
      .getByRole('table', { name: 'Due services' })
      .getByRole('row')
      .filter({ hasText: DUE_TRUTH_FLEET });
    await row.getByText('38 h over').waitFor();
    expect(await row.innerText()).toMatch(/Overdue/);
  });

  it('machine page — the schedule says "38 h over", the due list\'s words', async () => {
    await page.goto(`/o/${org}/machines/${machineId}`);
    await page.getByRole('heading', { name: new RegExp(`^${DUE_TRUTH_FLEET} · `) }).waitFor();
    await page
      .getByText(/38 h over/)
      .first()
      .waitFor();
    expect(await page.getByText(/\blate\b/).count()).toBe(0);
  });

  it('meter replaced — a refused reading speaks in the meter fitted now, lifetime in brackets', async () => {
    const replaced = await page.request.post(
      `/api/v1/organizations/${org}/machines/${machineId}/meter-replacements`,
      {
        data: {
          oldFinalValue: 1300,
          newStartValue: 0,
          replacedAt: new Date(Date.now() - 30_000).toISOString(),
        },
      },
    );
    expect(replaced.status()).toBe(201);
    await page.goto(`/o/${org}/machines/${machineId}`);
    const form = page.getByRole('form', { name: 'Log a reading' });
    await form.getByLabel('Meter reading').fill('300');
    await form.getByRole('button', { name: 'Save reading' }).click();
    await form.getByText(/Reading 300 h \(1,600 h lifetime\)/).waitFor();
    expect(await form.innerText()).toContain('previous reading of 0 h (1,300 h lifetime)');
    // the task's details say its due meter against the meter fitted now: 1,262 h lifetime fell
    // before the new meter (fitted at 1,300 h lifetime, reading 0), so only the lifetime is said
    const card = page.getByRole('list', { name: 'Service tasks' }).getByRole('listitem').first();
    await card.getByText(/^Details/).click();
    expect(await card.innerText()).toContain('1,262 h lifetime (before the meter fitted now)');
  });
});
