import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  PHONE_VIEWPORT,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { LOG_HOURS_FLEET, MACHINE_PAGE_READING_FLEET } from './support/demo-fleet';

// The farm manager's main job (issue "Fleet, hour-meter readings and the due forecast"), in the browser.
const DESKTOP = { width: 1280, height: 800 };

interface Latest {
  machine: { id: string; fleetNumber: string; meterUnit: string };
  lastReading: { value: number; takenAt: string } | null;
}

async function orgId(page: Page) {
  const me = await (await page.request.get('/api/v1/me')).json();
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
  ).organization.id as string;
}

async function dueOf(page: Page, org: string, machineId: string) {
  const res = await (
    await page.request.get(`/api/v1/organizations/${org}/machines/${machineId}/due`)
  ).json();
  return res.data as { taskId: string; due: { remainingMeter: number | null } }[];
}

describe('fleet and forecast — the manager in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('dashboard — shows what is overdue and due soon across the Larkspur fleet', async () => {
    await page.goto('/');
    await page.getByRole('heading', { name: 'Dashboard' }).waitFor();
    const overdue = page.getByRole('button', { name: /^Overdue:? \d+/ });
    await overdue.waitFor();
    expect(Number((await overdue.innerText()).match(/\d+/)![0])).toBeGreaterThan(0);
    const soon = page.getByRole('button', { name: /^Due soon:? \d+/ });
    expect(Number((await soon.innerText()).match(/\d+/)![0])).toBeGreaterThan(0);
    const table = page.getByRole('table', { name: 'Due services' });
    await table.waitFor();
    expect(await table.getByRole('row').count()).toBeGreaterThan(3);
    expect(await table.innerText()).toMatch(/Overdue/);
    await screenshot(page, 'forecast-dashboard-desktop');
  });

  it('log hours — readings for several machines in one go; the due points move by the hours added', async () => {
    const org = await orgId(page);
    const latest = (
      await (await page.request.get(`/api/v1/organizations/${org}/readings/latest`)).json()
    ).data as Latest[];
    // machines no other browser file writes to, so the hours added are the only change
    const picks = LOG_HOURS_FLEET.map((fleet) =>
      latest.find((l) => l.machine.fleetNumber === fleet)!,
    );
    expect(picks.map((p) => p?.machine.meterUnit === 'h' && !!p.lastReading)).toEqual([true, true]);
    const before = await Promise.all(picks.map((p) => dueOf(page, org, p.machine.id)));

    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Log hours' })
      .click();
    await page.getByRole('heading', { name: 'Log hours' }).waitFor();
    const added: number[] = [];
    for (const p of picks) {
      // stay inside 24 h per elapsed day since the last reading (rounded down, never up past it)
      const elapsedDays = (Date.now() - new Date(p.lastReading!.takenAt).getTime()) / 86_400_000;
      const add = Math.floor(Math.min(6, 20 * elapsedDays) * 10) / 10;
      added.push(add);
      await page
        // exact: "C-01 reading" is also the end of "RC-01 reading" (and of other files' DC-01)
        .getByLabel(`${p.machine.fleetNumber} reading`, { exact: true })
        .fill(String(Math.round((p.lastReading!.value + add) * 10) / 10));
    }
    await page.getByRole('button', { name: 'Save readings' }).click();
    const status = page.getByRole('status').filter({ hasText: 'Saved 2 readings' });
    await status.waitFor();

    const after = await Promise.all(picks.map((p) => dueOf(page, org, p.machine.id)));
    for (const [i, rows] of after.entries()) {
      const task = rows.find((r) => r.due.remainingMeter !== null)!;
      const was = before[i].find((r) => r.taskId === task.taskId)!;
      expect(was.due.remainingMeter! - task.due.remainingMeter!).toBeCloseTo(added[i], 1);
    }
    await screenshot(page, 'forecast-log-hours');
  });

  it('import — a CSV with a bad row is refused and that row is shown by line number', async () => {
    // from the dashboard's navigation, whichever test ran before
    await page.goto('/');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Log hours' })
      .click();
    await page.getByRole('heading', { name: 'Log hours' }).waitFor();
    await page.getByRole('link', { name: 'Import a CSV file' }).click();
    await page.getByRole('heading', { name: 'Import readings' }).waitFor();
    const today = new Date().toISOString().slice(0, 10);
    const csv = `fleet number,taken at,value\nT-02,${today}T00:00:00Z,5\nNOPE-9,${today},10\n`;
    await page
      .getByLabel('CSV file')
      .setInputFiles({ name: 'readings.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('button', { name: 'Check file' }).click();
    const alert = page.getByRole('alert').filter({ hasText: /rows? ha(s|ve) errors/ });
    await alert.waitFor();
    const body = await page.locator('main').innerText();
    expect(body).toMatch(/Line 3: fleet number "NOPE-9" is not a machine of this farm/);
    expect(body).toMatch(/Line 2: .*lower than the previous reading/);
    expect(await page.getByRole('button', { name: /^Import \d+ readings?$/ }).isDisabled()).toBe(
      true,
    );
    await screenshot(page, 'forecast-import-errors');
  });

  it('machine page — opens T-02 with its due tasks and a drawn meter chart', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Fleet' })
      .click();
    await page.getByRole('heading', { name: 'Fleet' }).waitFor();
    await page
      .getByRole('link', { name: /^T-02\b/ })
      .first()
      .click();
    await page.getByRole('heading', { name: /^T-02 · / }).waitFor();
    await page.getByRole('list', { name: 'Service tasks' }).waitFor();
    const chart = page.locator('.recharts-surface').first();
    await chart.waitFor({ timeout: 20000 });
    expect(await page.locator('.recharts-surface path.recharts-curve').count()).toBeGreaterThan(0);
    expect(await page.locator('main').innerText()).toMatch(/Meter from [\d,.]+ h to [\d,.]+ h/);
    await screenshot(page, 'forecast-machine-t02');
  });

  it('machine page — a reading logged there shows on the Log hours list without a reload', async () => {
    const org = await orgId(page);
    const fleetNumber = MACHINE_PAGE_READING_FLEET;
    const created = await page.request.post(`/api/v1/organizations/${org}/machines`, {
      data: { fleetNumber, name: 'Brindle yard loader', category: 'tractor', meterUnit: 'h' },
    });
    expect(created.status()).toBe(201);
    // one page load from here on: Log hours first, so its list is in the client's cache
    await page.goto('/');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Log hours' }).click();
    await page.getByRole('heading', { name: 'Log hours' }).waitFor();
    const logHoursRow = () => page.getByRole('listitem').filter({ hasText: fleetNumber });
    await logHoursRow().getByText('No reading yet').waitFor();
    await page.evaluate(() => Object.assign(window, { e2eSameLoad: true }));

    await nav.getByRole('link', { name: 'Fleet' }).click();
    await page.getByRole('heading', { name: 'Fleet' }).waitFor();
    await page
      .getByRole('link', { name: new RegExp(fleetNumber) })
      .first()
      .click();
    await page.getByRole('heading', { name: new RegExp(`^${fleetNumber} · `) }).waitFor();
    const form = page.getByRole('form', { name: 'Log a reading' });
    await form.getByLabel('Meter reading').fill('1234.5');
    await form.getByRole('button', { name: 'Save reading' }).click();
    await form.getByText(/Reading saved: 1,?234\.5 h/).waitFor();

    await nav.getByRole('link', { name: 'Log hours' }).click();
    await page.getByRole('heading', { name: 'Log hours' }).waitFor();
    await logHoursRow()
      .getByText(/1,?234\.5 h/)
      .waitFor({ timeout: 10_000 });
    expect(await page.evaluate(() => 'e2eSameLoad' in window)).toBe(true);
  });

  it('phone — the operator logs hours on a 360 px screen', async () => {
    // a browser of its own: signing lena in must not sign the manager out of the other tests' page
    const phoneBrowser = await launchBrowser();
    try {
      const phone = await phoneBrowser.newPage(PHONE_VIEWPORT);
      await signIn(phone, 'lena@larkspur.example', 'hourstone-demo');
      await phone
        .getByRole('navigation', { name: 'Main' })
        .getByRole('link', { name: 'Log hours' })
        .click();
      await phone.getByRole('heading', { name: 'Log hours' }).waitFor();
      const inputs = phone.getByRole('textbox', { name: / reading$/ });
      // the list arrives after the heading: wait for its first row instead of counting at once
      await inputs.first().waitFor();
      const box = await inputs.first().boundingBox();
      expect(box!.height).toBeGreaterThanOrEqual(40); // big touch target
      expect(box!.x + box!.width).toBeLessThanOrEqual(PHONE_VIEWPORT.width);
      await screenshot(phone, 'forecast-log-hours-phone');
    } finally {
      await phoneBrowser.close();
    }
  });
});
