// Issue 10, the advisor's items, in the browser: a board row opens the customer's machine (its due
// tasks, last reading and, with a service link, its history, Record service and Plan a service;
// with a view link none of those); overdue rows say how far over; on a phone the filters fold
// behind a "Filters" button so the first row is on the first screen, and the parts forecast never
// cuts its "First needed" column. Writes only AD-01, a Larkspur Flats machine it adds itself
// (support/demo-fleet.ts); Osier Creek (the demo's view link) is only read.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { ADVISOR_FLEET } from './support/demo-fleet';

const DESKTOP = { width: 1366, height: 800 };
const PHONE = { width: 390, height: 844 };
const DAY = 86_400_000;
const MACHINE = 'Corvid loader tractor';
const METER_TASK = 'Front axle oil';
const CALENDAR_TASK = 'Cab filter check';

async function orgNamed(page: Page, name: string) {
  const me = await (await page.request.get('/api/v1/me')).json();
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === name,
  ).organization.id as string;
}

/** As Marta (Larkspur Flats' manager): AD-01 with 10 h a day, one task 38 h past its meter and
 * one 12 days past its date. */
async function addMachine(page: Page): Promise<{ farmId: string; machineId: string }> {
  const farmId = await orgNamed(page, 'Larkspur Flats Farm');
  const api = `/api/v1/organizations/${farmId}`;
  const created = await page.request.post(`${api}/machines`, {
    data: { fleetNumber: ADVISOR_FLEET, name: MACHINE, category: 'tractor' },
  });
  expect(created.status()).toBe(201);
  const machineId = (await created.json()).data.id as string;
  for (const [daysAgo, value] of [
    [30, 1000],
    [15, 1150],
    [0, 1300],
  ]) {
    const takenAt = new Date(Date.now() - daysAgo * DAY - 60_000).toISOString();
    const res = await page.request.post(`${api}/machines/${machineId}/readings`, {
      data: { value, takenAt },
    });
    expect(res.status()).toBe(201);
  }
  const lastDone = async (name: string, interval: object, meter: number, daysAgo: number) => {
    const task = await page.request.post(`${api}/machines/${machineId}/tasks`, {
      data: { name, ...interval },
    });
    expect(task.status()).toBe(201);
    const lastDoneOn = new Date(Date.now() - daysAgo * DAY).toISOString().slice(0, 10);
    const res = await page.request.put(`${api}/tasks/${(await task.json()).data.id}/last-done`, {
      data: { lastDoneMeter: meter, lastDoneOn },
    });
    expect(res.status()).toBe(200);
  };
  // due at 1,262 h, read 1,300 h: 38 h over
  await lastDone(METER_TASK, { intervalMeter: 250 }, 1012, 29);
  // a year (365 days) from 377 days ago: 12 days over
  await lastDone(CALENDAR_TASK, { intervalDays: 365 }, 1000, 377);
  return { farmId, machineId };
}

/** The board filtered by URL (the filters' own behaviour is dealer.e2e.ts's). */
async function board(page: Page, dealerId: string, search: Record<string, string>) {
  await page.goto(`/o/${dealerId}/board?${new URLSearchParams(search)}`);
  await page.getByRole('heading', { name: 'Coming due', level: 1 }).waitFor();
}

describe('advisor — the board opens a customer machine, in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  let dealerId: string;
  let farmId: string;
  let machineId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    ({ farmId, machineId } = await addMachine(page));
    await signIn(page, 'ravi@quillon.example', 'hourstone-demo');
    dealerId = await orgNamed(page, 'Quillon Equipment & Service');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('board — overdue rows say how far over: "38 h over", "12 days over"', async () => {
    await board(page, dealerId, { customer: farmId, status: 'overdue' });
    const table = page.getByRole('table', { name: 'Services coming due across customers' });
    const meterRow = table.getByRole('row').filter({ hasText: METER_TASK });
    await meterRow.filter({ hasText: ADVISOR_FLEET }).waitFor();
    expect(await meterRow.innerText()).toContain('38 h over');
    const dayRow = table.getByRole('row').filter({ hasText: CALENDAR_TASK });
    expect(await dayRow.innerText()).toMatch(/1[1-3] days over/);
    // every overdue row of the board says how far, never only "Overdue"
    const projected = await table.locator('tbody tr td:nth-child(6)').allInnerTexts();
    expect(projected.length).toBeGreaterThan(0);
    for (const text of projected) expect(text).toMatch(/over/);
  });

  it('service link — a row opens the machine: due figures, last reading, history; record a service there', async () => {
    await board(page, dealerId, { customer: farmId, task: METER_TASK });
    await page
      .getByRole('link', { name: `${ADVISOR_FLEET} ${MACHINE}` })
      .first()
      .click();
    await page.waitForURL(new RegExp(`/o/${dealerId}/customers/${farmId}/machines/${machineId}$`));
    await page.getByRole('heading', { name: `${ADVISOR_FLEET} · ${MACHINE}`, level: 1 }).waitFor();
    const tasks = page.getByRole('list', { name: 'Service tasks' });
    await tasks
      .getByText(/38 h over/)
      .first()
      .waitFor();
    expect(await page.getByText('Service access', { exact: true }).count()).toBe(1);
    expect(await page.getByText(/1,300(\.0)? h/).count()).toBeGreaterThan(0);
    await page.getByRole('heading', { name: 'Service history' }).waitFor();
    await page.getByText('No services recorded yet').waitFor();
    await page.getByRole('link', { name: 'Plan a service' }).waitFor();
    // nothing of the farm's own: no walkaround, defects, status change, schedule or readings edits
    for (const name of [
      'Daily walkaround',
      'Defects',
      'Return to service',
      'Add task',
      'Log a reading',
    ])
      expect(
        await page.getByRole('link', { name }).or(page.getByRole('button', { name })).count(),
      ).toBe(0);
    await screenshot(page, 'advisor-machine-service');

    await page.getByRole('link', { name: `Record service for ${METER_TASK}` }).click();
    await page.getByRole('heading', { name: `Record service · ${ADVISOR_FLEET}` }).waitFor();
    // the farm's team and defects are not the dealer's to name or close
    expect(await page.getByText('Defects this visit fixes').count()).toBe(0);
    expect(await page.getByRole('group', { name: 'Technicians' }).count()).toBe(0);
    await page.getByLabel('Meter at service').fill('1300');
    await page
      .getByRole('textbox', { name: 'Notes' })
      .fill('Browser test: the dealer changed the front axle oil.');
    await page.getByRole('button', { name: 'Complete service' }).click();
    await page.waitForURL(new RegExp(`/o/${dealerId}/customers/${farmId}/service-records/`));
    await page.getByRole('heading', { name: new RegExp(`^Service · ${ADVISOR_FLEET}`) }).waitFor();
    await screenshot(page, 'advisor-service-recorded');

    await page.getByRole('link', { name: `${ADVISOR_FLEET} · ${MACHINE}` }).click();
    await page.getByRole('heading', { name: `${ADVISOR_FLEET} · ${MACHINE}`, level: 1 }).waitFor();
    const history = page.getByRole('list', { name: 'Service history' });
    await history.getByText(METER_TASK).first().waitFor();
    expect(await tasks.filter({ hasText: '38 h over' }).count()).toBe(0);
  });

  it('service link — Plan a service opens the plan form for the machine', async () => {
    await page.goto(`/o/${dealerId}/customers/${farmId}/machines/${machineId}`);
    await page.getByRole('link', { name: 'Plan a service' }).click();
    await page.getByRole('heading', { name: `Plan a service · ${ADVISOR_FLEET}` }).waitFor();
    await page.getByLabel('Planned for').waitFor();
    await page.getByRole('button', { name: 'Save plan' }).waitFor();
  });

  it('view link — the row opens a read view: no history, no Record or Plan; the API refuses them', async () => {
    const osier = (
      (await (await page.request.get(`/api/v1/organizations/${dealerId}/customers`)).json())
        .data as { customer: { id: string; name: string } | null; access: string | null }[]
    ).find((c) => c.customer?.name === 'Osier Creek Dairy')!;
    expect(osier.access).toBe('view');
    await board(page, dealerId, { customer: osier.customer!.id });
    const table = page.getByRole('table', { name: 'Services coming due across customers' });
    const link = table.getByRole('link').first();
    await link.waitFor();
    const name = (await link.innerText()).replace(/\s+/g, ' ').trim();
    await link.click();
    await page.getByRole('heading', { name: name.replace(' ', ' · '), level: 1 }).waitFor();
    await page.getByRole('list', { name: 'Service tasks' }).waitFor();
    expect(await page.getByText('View access', { exact: true }).count()).toBe(1);
    for (const text of ['Record service', 'Plan a service', 'Service history'])
      expect(await page.getByText(text, { exact: true }).count()).toBe(0);
    await screenshot(page, 'advisor-machine-view');

    const osierMachine = page.url().split('/machines/')[1];
    const api = `/api/v1/organizations/${osier.customer!.id}/machines/${osierMachine}`;
    expect((await page.request.get(`${api}/service-records`)).status()).toBe(404);
    const refused = await page.request.post(`${api}/service-records`, {
      data: { status: 'planned', plannedFor: new Date().toISOString().slice(0, 10), taskIds: [] },
    });
    expect(refused.status()).toBe(404);
    // and the form's own address shows nothing for a view link
    await page.goto(
      `/o/${dealerId}/customers/${osier.customer!.id}/machines/${osierMachine}/services/new`,
    );
    await page
      .getByText(/Nothing here|Not available/)
      .first()
      .waitFor();
  });

  it('phone — the filters fold behind "Filters" (with how many are on) and the first row is on the first screen', async () => {
    const phone = await browser.newPage(PHONE);
    await board(phone, dealerId, {});
    const toggle = phone.getByRole('button', { name: /^Filters/ });
    expect(await toggle.innerText()).toBe('Filters');
    expect(await toggle.getAttribute('aria-expanded')).toBe('false');
    expect(await phone.getByLabel('Customer', { exact: true }).count()).toBe(0);
    const cards = phone.getByRole('list', { name: 'Services coming due across customers' });
    await cards.getByRole('listitem').first().waitFor();
    const full = await screenshot(phone, 'advisor-board-phone');
    await phone.screenshot({ path: full.replace(/\.png$/, '-first-screen.png') });
    // the first row's machine link is on the first screen, not under the phone's menu bar
    const link = cards.getByRole('listitem').first().getByRole('link').first();
    const onTop = await link.evaluate((el) => {
      const r = el.getBoundingClientRect();
      const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
      return r.bottom <= window.innerHeight && !!hit && el.contains(hit);
    });
    expect(onTop).toBe(true);

    await board(phone, dealerId, { customer: farmId, status: 'overdue' });
    expect(await toggle.innerText()).toBe('Filters (2 on)');
    await toggle.click();
    await phone.getByLabel('Customer', { exact: true }).waitFor();
    expect(await toggle.getAttribute('aria-expanded')).toBe('true');
    await phone.close();
  });

  for (const viewport of [PHONE, DESKTOP])
    it(`parts forecast — "First needed" is not cut at ${viewport.width} px`, async () => {
      const p = await browser.newPage(viewport);
      await p.goto(`/o/${dealerId}/parts`);
      await p.getByRole('heading', { name: 'Parts forecast', level: 1 }).waitFor();
      const tables = p.getByRole('table', { name: /^Parts and fluids: / });
      await tables.first().waitFor();
      const cut = await p.evaluate(() =>
        [...document.querySelectorAll('table')].flatMap((table) => {
          const frame = table.parentElement!.getBoundingClientRect();
          const cells = [...table.querySelectorAll('tr > :nth-child(4)')];
          return cells
            .filter((cell) => {
              const r = cell.getBoundingClientRect();
              return r.right > frame.right + 0.5 || r.right > window.innerWidth + 0.5;
            })
            .map((cell) => cell.textContent);
        }),
      );
      expect(cut).toEqual([]);
      const header = tables.first().getByRole('columnheader', { name: 'First needed' });
      expect(await header.isVisible()).toBe(true);
      await screenshot(p, `advisor-parts-${viewport.width}`);
      await p.close();
    });
});
