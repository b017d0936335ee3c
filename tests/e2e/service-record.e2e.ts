import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  PHONE_VIEWPORT,
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { SERVICE_RECORD_FLEET } from './support/demo-fleet';

// The shop's side (issue "Service records, daily walkarounds and defects"), in the browser: a
// technician records a visit on a machine no other browser test writes to (support/demo-fleet.ts),
// is refused while a reassembly setting is unticked, ticks it, completes, and sees the task reset.
// Each test opens its own page from the dashboard and needs nothing another test did, so the
// tests pass in any order and alone (`-t`); only the sign-in is shared (the browser's cookies).
const DESKTOP = { width: 1280, height: 800 };
const FLEET_NUMBER = SERVICE_RECORD_FLEET;

interface MachineRow {
  id: string;
  fleetNumber: string;
  name: string;
  lastReading: { value: number } | null;
}
interface TaskRow {
  id: string;
  name: string;
  intervalMeter: number | null;
  intervalDays: number | null;
  dailyCare: boolean;
}

async function orgId(page: Page) {
  const me = await (await page.request.get('/api/v1/me')).json();
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
  ).organization.id as string;
}

async function api<T>(page: Page, path: string): Promise<T> {
  const res = await page.request.get(`/api/v1${path}`);
  expect(res.status(), path).toBe(200);
  return (await res.json()) as T;
}

/** A fresh desktop page on the dashboard, with the page errors it logs. */
async function openDashboard(browser: TestBrowser) {
  const page = await browser.newPage(DESKTOP);
  const errors = collectPageErrors(page);
  await page.goto('/');
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  return { page, errors };
}

describe('service records — the technician in the browser', () => {
  let browser: TestBrowser;
  let org: string;
  let machine: MachineRow;
  let task: TaskRow;

  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'dev@larkspur.example', 'hourstone-demo');
    org = await orgId(page);
    const machines = await api<{ data: MachineRow[] }>(
      page,
      `/organizations/${org}/machines?q=${FLEET_NUMBER}`,
    );
    machine = machines.data.find((m) => m.fleetNumber === FLEET_NUMBER)!;
    const tasks = await api<{ data: TaskRow[] }>(
      page,
      `/organizations/${org}/machines/${machine.id}/tasks`,
    );
    // a task on hours alone, so "remaining" after the visit is exactly its interval; not daily
    // care, which operators sign off in the walkaround and which stays off the due list
    const serviced = tasks.data.filter((t) => !t.dailyCare && t.intervalMeter !== null);
    task = serviced.find((t) => t.intervalDays === null) ?? serviced[0];
    await page.close();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('record service — refused beside an unticked reassembly setting, completed once it is ticked; the record shows the task reset, the machine page a whole interval left', async () => {
    expect(machine?.lastReading).not.toBeNull();
    expect(task).toBeDefined();
    const { page, errors } = await openDashboard(browser);
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Fleet' })
      .click();
    await page.getByRole('heading', { name: 'Fleet' }).waitFor();
    await page
      .getByRole('link', { name: new RegExp(FLEET_NUMBER) })
      .first()
      .click();
    await page.getByRole('heading', { name: new RegExp(`^${FLEET_NUMBER} · `) }).waitFor();
    await page.getByRole('link', { name: 'Record service', exact: true }).waitFor();
    await page.getByRole('link', { name: 'Plan a service', exact: true }).waitFor();

    // the due task's own shortcut opens the form with that task chosen
    await page.getByRole('link', { name: `Record service for ${task.name}` }).click();
    await page.getByRole('heading', { name: `Record service · ${FLEET_NUMBER}` }).waitFor();
    expect(await page.getByRole('checkbox', { name: task.name, exact: true }).isChecked()).toBe(
      true,
    );

    // the meter as it reads now: a valid reading (not backwards, not in the future)
    await page.getByLabel('Meter at service').fill(String(machine.lastReading!.value));
    await page.getByRole('button', { name: 'Add setting' }).click();
    const setting = page.getByRole('group', { name: 'Setting 1' });
    await setting.getByLabel('What was counted, removed or set').fill('Charge pump relief shims');
    await setting.getByLabel('Value').fill('1.2 mm pack, under the cap');
    // amounts are typed as decimals of the farm's currency and added exactly (0.10 + 0.20)
    for (const [i, amount] of ['0.10', '0.20'].entries()) {
      await page.getByRole('button', { name: 'Add cost' }).click();
      const cost = page.getByRole('group', { name: `Cost ${i + 1}` });
      await cost.getByLabel('Cost description').fill(`Shop rags ${i + 1}`);
      await cost.getByLabel('Amount').fill(amount);
    }
    await page.getByRole('button', { name: 'Complete service' }).click();

    // the server refuses and says so beside that setting; nothing was recorded
    await setting.getByText(/is not ticked as restored/).waitFor();
    await page.getByLabel('Reason a setting is not restored').waitFor();
    expect(page.url()).toMatch(/\/services\/new/);
    await screenshot(page, 'service-record-refused');

    await setting.getByRole('checkbox', { name: 'Restored' }).check();
    await page.getByRole('button', { name: 'Complete service' }).click();
    await page
      .getByRole('heading', { name: new RegExp(`^Service · ${FLEET_NUMBER} · `) })
      .waitFor();
    const resets = page.getByRole('list', { name: 'Tasks reset' });
    await resets.waitFor();
    expect(await resets.innerText()).toContain(`${task.name}: reset`);
    const costs = await page.getByLabel('Costs', { exact: true }).innerText();
    expect(costs).toMatch(/Other\s*\$0\.30/);
    expect(costs).toMatch(/Total\s*\$0\.30/);
    const restored = page.getByRole('list', { name: 'Reassembly settings' });
    expect(await restored.innerText()).toMatch(/Charge pump relief shims[\s\S]*Restored/);
    const recordPath = new URL(page.url()).pathname;
    await screenshot(page, 'service-record-completed');

    const phone = await browser.newPage(PHONE_VIEWPORT);
    await phone.goto(page.url());
    await phone.getByRole('heading', { name: new RegExp(`^Service · ${FLEET_NUMBER}`) }).waitFor();
    await screenshot(phone, 'service-record-completed-phone');
    await phone.close();

    // the machine page: the task's new due point counts a whole interval from the visit
    await page.getByRole('link', { name: `${FLEET_NUMBER} · ${machine.name}` }).click();
    const list = page.getByRole('list', { name: 'Service tasks' });
    await list.waitFor();
    const card = list
      .getByRole('listitem')
      .filter({ has: page.getByRole('heading', { name: task.name, exact: true }) });
    const left = new Intl.NumberFormat('en-US').format(task.intervalMeter!);
    // the card's summary line: "Due 1,711.9 h — 500 h left"
    await card.getByText(new RegExp(`^Due .* — ${left} h left`)).waitFor();

    const due = await api<{ data: { taskId: string; due: { remainingMeter: number | null } }[] }>(
      page,
      `/organizations/${org}/machines/${machine.id}/due`,
    );
    const row = due.data.find((r) => r.taskId === task.id)!;
    expect(row.due.remainingMeter).toBeCloseTo(task.intervalMeter!, 1);

    // the new record is in the history and opens from there
    const history = page.getByRole('list', { name: 'Service history' });
    const entry = history.locator(`a[href="${recordPath}"]`);
    expect(await entry.innerText()).toContain(task.name);
    await screenshot(page, 'service-record-machine-page');

    // the refusal (422) is the only error the page logged
    expect(errors.filter((e) => !/status of (401|422)/.test(e))).toEqual([]);
    await page.close();
  }, 120_000);

  it('shop week — a day of the week shows planned work (the demo books visits in the coming days)', async () => {
    const { page, errors } = await openDashboard(browser);
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Shop week' })
      .click();
    await page.getByRole('heading', { name: 'Shop week', level: 1 }).waitFor();
    await page.getByRole('list', { name: 'Days of the week' }).waitFor();
    let planned = page.getByRole('list', { name: /^Planned on / });
    // late in the week the demo's bookings fall into the next one
    if ((await planned.count()) === 0) {
      await page.getByRole('link', { name: 'Next week' }).click();
      await page.waitForURL(/start=/);
      await page.getByRole('list', { name: 'Days of the week' }).waitFor();
      planned = page.getByRole('list', { name: /^Planned on / });
      await planned.first().waitFor();
    }
    expect(await planned.count()).toBeGreaterThan(0);
    expect(await planned.first().innerText()).toMatch(/Planned · [\d.]+ h/);
    await screenshot(page, 'service-shop-week');

    const phone = await browser.newPage(PHONE_VIEWPORT);
    await phone.goto(page.url());
    await phone.getByRole('heading', { name: 'Shop week', level: 1 }).waitFor();
    await phone.getByRole('list', { name: 'Days of the week' }).waitFor();
    const box = await phone.getByRole('list', { name: 'Days of the week' }).boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(PHONE_VIEWPORT.width);
    await screenshot(phone, 'service-shop-week-phone');
    await phone.close();

    expect(errors.filter((e) => !/status of 401/.test(e))).toEqual([]);
    await page.close();
  });
});
