// Issue 13, several meters per machine, in the browser: the manager adds a PTO-hours meter to a
// tractor of her own (MT-01, written by no other file), logs a reading on it, puts a task on it
// ("Counts on meter") and sees the task fall due on the PTO meter, not the engine's; the meter
// with readings cannot be removed (the server's reason shown). Then an operator records a
// counter reset on her baler's bale counter (MT-02) and the reading history shows it. Both
// pages fit a 390 px phone without scrolling sideways.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { METERS_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';
import { apiGet, type Member } from './support/role-flows-api';
import { fitProblems, settle } from './support/screen-checks';

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 800 };
const PHONE = { width: 390, height: 844 };
const DAY = 86_400_000;
const [TRACTOR, BALER] = METERS_FLEET;
const TASK = 'PTO gearbox oil';

/** The page at a phone's width scrolls no wider than the screen. */
async function expectFitsPhone(
  browser: TestBrowser,
  url: string,
  shot: string,
  prepare?: (phone: Page) => Promise<void>,
) {
  const phone = await browser.newPage(PHONE);
  await phone.goto(url);
  await settle(phone);
  await prepare?.(phone);
  expect(await fitProblems(phone, [])).toEqual([]);
  await screenshot(phone, shot);
  await phone.close();
}

describe('meters — a PTO-hours meter with its reading and task; a bale counter reset', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let tractorId: string;
  let balerId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    org = (await larkspurFarm(page)).id;
    const members = (await apiGet(page, `/organizations/${org}/members`)).data as Member[];
    const lena = members.find((m) => m.user.email === 'lena@larkspur.example')!.user.id;
    tractorId = await addOwnMachine(
      page,
      org,
      { fleetNumber: TRACTOR, name: 'Meters tractor', category: 'tractor', meterUnit: 'h' },
      [
        { agoMs: 10 * DAY, value: 1180 },
        { agoMs: 60_000, value: 1200 },
      ],
    );
    balerId = await addOwnMachine(
      page,
      org,
      {
        fleetNumber: BALER,
        name: 'Meters baler',
        category: 'baler',
        meterUnit: 'bales',
        operatorIds: [lena],
      },
      [
        { agoMs: 20 * DAY, value: 3400 },
        { agoMs: 2 * DAY, value: 3520 },
      ],
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the manager adds a PTO-hours meter; a second one without a label is refused beside the field', async () => {
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/machines/${tractorId}#meter`);
    const section = page.getByRole('region', { name: 'Meters' });
    const list = section.getByRole('list', { name: 'Meters' });
    const engine = list.getByRole('listitem', { name: 'Engine hours' });
    await engine.getByText('Primary', { exact: true }).waitFor();
    expect(await engine.innerText()).toContain('1,200 h');

    await section.getByRole('button', { name: 'Add meter' }).click();
    let form = section.getByRole('form', { name: 'Add a meter' });
    await form.getByLabel('Kind').selectOption({ label: 'PTO hours' });
    await form.getByRole('button', { name: 'Add meter' }).click();
    await section.getByText('PTO hours added.', { exact: false }).waitFor();
    const pto = list.getByRole('listitem', { name: 'PTO hours' });
    await pto.getByText('No readings yet').waitFor();
    expect(await pto.getByText('Primary', { exact: true }).count()).toBe(0);

    await section.getByRole('button', { name: 'Add meter' }).click();
    form = section.getByRole('form', { name: 'Add a meter' });
    await form.getByLabel('Kind').selectOption({ label: 'PTO hours' });
    await form.getByRole('button', { name: 'Add meter' }).click();
    const label = form.getByLabel('Label');
    await expect.poll(() => label.getAttribute('aria-invalid')).toBe('true');
    expect(await form.innerText()).toMatch(/already has a PTO hours meter without a label/);
    await form.getByRole('button', { name: 'Cancel' }).click();
    expect(await list.getByRole('listitem').count()).toBe(2);
    // the refused add is the one failed request the console reports
    expect(errors.filter((e) => !e.includes('status of 422'))).toEqual([]);
  });

  it('logs 120 h on the PTO meter; the PTO history shows it and the engine history does not', async () => {
    // an earlier PTO reading, so the meter has a trend (the meter's id from its list)
    const meters = (await apiGet(page, `/organizations/${org}/machines/${tractorId}/meters`))
      .data as { id: string; kind: string }[];
    const ptoId = meters.find((m) => m.kind === 'pto_hours')!.id;
    const earlier = await page.request.post(
      `/api/v1/organizations/${org}/machines/${tractorId}/readings`,
      {
        data: { value: 100, meterId: ptoId, takenAt: new Date(Date.now() - 7 * DAY).toISOString() },
      },
    );
    expect(earlier.status()).toBe(201);

    const readings = page.getByRole('region', { name: 'Readings' });
    const form = readings.getByRole('form', { name: 'Log a reading' });
    await form.getByLabel('Meter', { exact: true }).selectOption({ label: 'PTO hours' });
    await form.getByLabel('Meter reading').fill('120');
    await form.getByRole('button', { name: 'Save reading' }).click();
    await form.getByText('Reading saved: 120 hours.').waitFor();

    const history = readings.getByRole('list', { name: 'Reading history' });
    await history.getByText('1,200 h', { exact: false }).first().waitFor();
    expect(await history.getByRole('listitem').filter({ hasText: '120 h' }).count()).toBe(0);
    await readings.getByRole('radio', { name: 'PTO hours' }).check({ force: true });
    await history.getByText('120 h', { exact: false }).first().waitFor();
    expect(await history.getByRole('listitem').filter({ hasText: '1,200 h' }).count()).toBe(0);

    const pto = page
      .getByRole('list', { name: 'Meters' })
      .getByRole('listitem', { name: 'PTO hours' });
    await pto.getByText('120 h', { exact: true }).waitFor();
  });

  it('a task counting on the PTO meter falls due at 350 h on it; its chart lists the due point', async () => {
    const due = page.getByRole('region', { name: 'Due' });
    await due.getByRole('button', { name: 'Add task' }).click();
    const form = due.getByRole('form', { name: 'Add task' });
    await form.getByLabel('Task name').fill(TASK);
    await form.getByLabel('Counts on meter').selectOption({ label: 'PTO hours' });
    await form.getByLabel('Meter interval').fill('250');
    await form.getByRole('button', { name: 'Add task' }).click();
    await due.getByText(`${TASK} is on the schedule.`).waitFor();
    const card = due.getByRole('list', { name: 'Service tasks' }).getByRole('listitem').filter({
      hasText: TASK,
    });
    // a new task on a machine with readings: its last service is asked for, here at 100 PTO hours
    await card.getByRole('button', { name: `Set last done for ${TASK}` }).click();
    const lastDone = due.getByRole('form', { name: `Set last done for ${TASK}` });
    await lastDone.getByLabel('Meter when last done').fill('100');
    await lastDone.getByRole('button', { name: 'Save last done' }).click();
    await lastDone.waitFor({ state: 'detached' });
    // 100 + 250 = 350 PTO hours, 230 to go from 120; counted on the engine's 1,200 h it would
    // be long overdue
    await expect.poll(() => card.innerText(), { timeout: 15_000 }).toMatch(/Due 350 h/);
    expect(await card.innerText()).not.toMatch(/overdue/i);

    const meters = page.getByRole('region', { name: 'Meters' });
    await meters.getByRole('radio', { name: 'PTO hours' }).check({ force: true });
    await expect
      .poll(async () => (await meters.textContent()) ?? '')
      .toMatch(new RegExp(`Due at 350 h\\s*: ${TASK}`));
    await meters.getByRole('radio', { name: 'Engine hours' }).check({ force: true });
    await expect.poll(async () => (await meters.textContent())?.includes(TASK)).toBe(false);
    await screenshot(page, 'meters-pto-task');
  });

  it('removing the PTO meter is refused with the server’s reason; it stays', async () => {
    const list = page.getByRole('list', { name: 'Meters' });
    await list
      .getByRole('listitem', { name: 'PTO hours' })
      .getByRole('button', { name: 'Remove' })
      .click();
    const dialog = page.getByRole('dialog', { name: 'Remove PTO hours?' });
    await dialog.getByRole('button', { name: 'Remove meter' }).click();
    await dialog.getByText(/This meter has 2 readings and 1 task/).waitFor();
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    expect(await list.getByRole('listitem', { name: 'PTO hours' }).count()).toBe(1);
  });

  it('renames the PTO meter “Rear” and makes it primary; the mark moves', async () => {
    const section = page.getByRole('region', { name: 'Meters' });
    const list = section.getByRole('list', { name: 'Meters' });
    await list
      .getByRole('listitem', { name: 'PTO hours' })
      .getByRole('button', { name: 'Rename' })
      .click();
    const form = list.getByRole('form', { name: 'Rename PTO hours' });
    await form.getByLabel('Label').fill('Rear');
    await form.getByRole('button', { name: 'Save name' }).click();
    await section.getByText('Renamed: PTO hours — Rear.').waitFor();
    const rear = list.getByRole('listitem', { name: 'PTO hours — Rear' });
    await rear.getByRole('button', { name: 'Make primary' }).click();
    await section.getByText('PTO hours — Rear is now the primary meter.').waitFor();
    await rear.getByText('Primary', { exact: true }).waitFor();
    const engine = list.getByRole('listitem', { name: 'Engine hours' });
    await engine.getByRole('button', { name: 'Make primary' }).waitFor();
    expect(await engine.getByText('Primary', { exact: true }).count()).toBe(0);
    // on a phone, the list and the open add form fit the width
    await expectFitsPhone(
      browser,
      `/o/${org}/machines/${tractorId}#meter`,
      'meters-phone',
      (phone) => phone.getByRole('button', { name: 'Add meter' }).click(),
    );
  });

  it('the operator resets the bale counter; the history shows the reset, the meters read only', async () => {
    await signIn(page, 'lena@larkspur.example', PASSWORD);
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/machines/${balerId}#readings`);
    const meters = page.getByRole('region', { name: 'Meters' });
    await meters.getByRole('listitem', { name: 'Bale counter' }).waitFor();
    await meters.getByText('A manager or technician adds and changes meters.').waitFor();
    expect(await meters.getByRole('button', { name: /Add meter|Rename|Remove/ }).count()).toBe(0);

    const readings = page.getByRole('region', { name: 'Readings' });
    const form = readings.getByRole('form', { name: 'Log a reading' });
    await form.getByLabel('Counter was reset').check();
    await form.getByLabel('Count before the reset').fill('3560');
    await form.getByLabel('Count after the reset').fill('0');
    await form.getByRole('button', { name: 'Save counter reset' }).click();
    await expect
      .poll(() => form.innerText(), { timeout: 15_000 })
      .toContain('Counter reset saved: 3,560 bales before, 0 bales after.');

    const history = readings.getByRole('list', { name: 'Reading history' });
    const reset = history.getByRole('listitem').filter({ hasText: 'Counter reset' });
    await reset.waitFor();
    expect(await reset.innerText()).toMatch(/counted 3,560 bales before, started again at 0 bales/);
    await screenshot(page, 'meters-counter-reset');
    expect(errors).toEqual([]);
    await expectFitsPhone(browser, `/o/${org}/machines/${balerId}#readings`, 'meters-reset-phone');
  });
});
