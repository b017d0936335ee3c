// Issue 11, season services in the browser: the manager adds a combine that harvests August to
// October (SE-01, no readings) and, on its page, gives it a pre-season service 21 days before
// the season starts. A day interval beside the season is refused beside the field; without it the
// card says when the task falls due in the shared words, and the date is 1 Aug − 21 days = 11 Jul
// (counted from today: this year's August, or next year's once it has begun). Writes only SE-01.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, signIn, type TestBrowser } from './support/browser';
import { SEASON_SERVICE_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';
import { todayIso } from '../../shared/domain';

const DESKTOP = { width: 1280, height: 800 };

describe('season services — a pre-season service on the machine page', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let timeZone: string;
  let machineId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    ({ id: org, timeZone } = await larkspurFarm(page));
    machineId = await addOwnMachine(page, org, {
      fleetNumber: SEASON_SERVICE_FLEET,
      name: 'Harvest combine',
      category: 'combine',
      seasonMonths: [8, 9, 10],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the manager adds "Pre-season inspection", 21 days before the season starts; the card says so and it is due 11 Jul', async () => {
    await page.goto(`/o/${org}/machines/${machineId}`);
    await page.getByRole('heading', { name: new RegExp(`^${SEASON_SERVICE_FLEET} · `) }).waitFor();
    await page.getByRole('button', { name: 'Add task' }).click();
    const form = page.getByRole('form', { name: 'Add task' });
    await form.getByLabel('Task name').fill('Pre-season inspection');
    await form.getByLabel('Season service').selectOption({ label: 'Before the season starts' });
    await form.getByLabel('Season days').fill('21');
    await form.getByLabel('Day interval').fill('365');
    await form.getByRole('button', { name: 'Add task' }).click();
    await form.getByText(/clear the day interval/).waitFor();

    await form.getByLabel('Day interval').fill('');
    await form.getByRole('button', { name: 'Add task' }).click();
    await page.getByText('Pre-season inspection is on the schedule.').waitFor();
    const card = page.getByRole('list', { name: 'Service tasks' }).getByRole('listitem');
    await card.getByText('21 days before the season starts', { exact: true }).first().waitFor();
    await card
      .getByText(/^21 days before the season starts on .*Aug.*\d{4}/)
      .first()
      .waitFor();

    const today = todayIso(timeZone);
    const year = Number(today.slice(0, 4)) + (today > `${today.slice(0, 4)}-08-01` ? 1 : 0);
    const api = await page.request.get(`/api/v1/organizations/${org}/machines/${machineId}/tasks`);
    const [task] = (await api.json()).data;
    expect(task.due.dueDate).toBe(`${year}-07-11`);
    await page.screenshot({ path: '.screenshots/season-service.png', fullPage: true });
  });
});
