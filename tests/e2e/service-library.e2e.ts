// Issue 11, the service library in the browser: the manager adds a used round baler (LB-01, its
// own), picks the class "Round baler" on the machine page and applies it in one step; every task
// of the class is on the schedule, history unknown (it came with hours), with the label that the
// intervals are common practice and the operator's manual wins. Writes only LB-01.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, signIn, type TestBrowser } from './support/browser';
import { LIBRARY_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';
import { serviceLibraryClass } from '../../shared/domain/service-library';

const DESKTOP = { width: 1280, height: 800 };

describe('service library — apply a machine class on the machine page', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let machineId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    org = (await larkspurFarm(page)).id;
    machineId = await addOwnMachine(
      page,
      org,
      { fleetNumber: LIBRARY_FLEET, name: 'Second-hand round baler', category: 'baler' },
      [{ agoMs: 60_000, value: 850 }],
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the manager picks "Round baler", applies it, and every task of the class is on the schedule, history unknown', async () => {
    const expected = serviceLibraryClass('round_baler').tasks.map((t) => t.name);
    await page.goto(`/o/${org}/machines/${machineId}`);
    await page.getByRole('heading', { name: new RegExp(`^${LIBRARY_FLEET} · `) }).waitFor();
    await page.getByRole('button', { name: 'Apply machine class' }).click();
    const panel = page.getByRole('region', { name: 'Apply a machine class' });
    await panel.getByLabel('Machine class').selectOption({ label: 'Round baler' });
    await panel.getByText("Common practice — the operator's manual wins").waitFor();
    await panel.getByText('Pickup tines and guards').waitFor();
    await panel.getByRole('button', { name: 'Apply class' }).click();
    await page.getByText(`Round baler: ${expected.length} tasks added`).waitFor();
    await page.getByText('Machine class:').waitFor();
    const tasks = page.getByRole('list', { name: 'Service tasks' });
    await tasks.getByText('Pickup tines and guards').waitFor();
    for (const name of expected)
      expect(await tasks.getByText(name, { exact: true }).count()).toBe(1);
    // every task of the class with a hazard shows its caution in full on its card — counted, so
    // the check cannot pass on an empty list
    const withHazard = serviceLibraryClass('round_baler').tasks.filter((t) => t.hazards.length);
    expect(withHazard.length).toBeGreaterThan(3);
    const cautions = tasks.getByRole('complementary', { name: 'Caution' });
    expect(await cautions.count()).toBe(withHazard.length);
    expect(await cautions.first().innerText()).toMatch(/operator's manual/);
    // it came with 850 h and no history: nothing pretends to be OK
    const api = await page.request.get(`/api/v1/organizations/${org}/machines/${machineId}/tasks`);
    const statuses = (await api.json()).data.map((t: { due: { status: string } }) => t.due.status);
    expect(new Set(statuses)).toEqual(new Set(['history_unknown']));
    await page.screenshot({ path: '.screenshots/service-library-applied.png', fullPage: true });
  });
});
