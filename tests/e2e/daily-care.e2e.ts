// Issue 11, daily care in the browser: the manager adds a tractor of lena's (DC-01, read at
// 1,200 h) with two daily-care tasks — a grease round last greased at 1,188 h and the fuel water
// separator last done at 1,195 h. Lena walks round it on her phone at 1,204 h and ticks
// "Greased"; the machine page then shows that task reset to 1,204 h today and the other as it
// was, and the dashboard's daily care says one done today, one not yet. Writes only DC-01.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  PHONE_VIEWPORT,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { DAILY_CARE_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';
import { apiGet, type Member } from './support/role-flows-api';
import { addDaysIso, todayIso } from '../../shared/domain';

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 800 };
const GREASE = 'Loader pivots and bucket pins';
const SEPARATOR = 'Fuel water separator: let the water out';

interface Task {
  id: string;
  name: string;
  lastDoneMeter: number | null;
  lastDoneOn: string | null;
}

describe('daily care — a grease sign-off in the walkaround', () => {
  let browser: TestBrowser;
  let org: string;
  let timeZone: string;
  let machineId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    ({ id: org, timeZone } = await larkspurFarm(page));
    const members = (await apiGet(page, `/organizations/${org}/members`)).data as Member[];
    const lena = members.find((m) => m.user.email === 'lena@larkspur.example')!.user.id;
    machineId = await addOwnMachine(
      page,
      org,
      {
        fleetNumber: DAILY_CARE_FLEET,
        name: 'Harl loader tractor',
        category: 'tractor',
        meterUnit: 'h',
        operatorIds: [lena],
      },
      [{ agoMs: 20 * 3_600_000, value: 1200 }],
    );
    const base = `/api/v1/organizations/${org}`;
    const yesterday = addDaysIso(todayIso(timeZone), -1);
    for (const [name, hazards, lastDoneMeter, instructions] of [
      [GREASE, ['raised_load'], 1188, 'Bucket on the ground. Grease every loader pivot and pin.'],
      [SEPARATOR, ['chemicals'], 1195, 'Open the bowl valve until clean diesel runs.'],
    ] as const) {
      const task = await page.request.post(`${base}/machines/${machineId}/tasks`, {
        data: { name, intervalMeter: 10, warnMeter: 1, dailyCare: true, hazards, instructions },
      });
      expect(task.status(), name).toBe(201);
      const done = await page.request.put(
        `${base}/tasks/${(await task.json()).data.id}/last-done`,
        {
          data: { lastDoneMeter, lastDoneOn: yesterday },
        },
      );
      expect(done.status(), name).toBe(200);
    }
    await page.close();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lena ticks "Greased" on her phone walkaround; the outcome says it was signed off', async () => {
    const page = await browser.newPage(PHONE_VIEWPORT);
    await signIn(page, 'lena@larkspur.example', PASSWORD);
    await page.goto(`/o/${org}/walkaround/${machineId}`);
    await page.getByRole('heading', { name: `Walkaround · ${DAILY_CARE_FLEET}` }).waitFor();
    await page.getByLabel('Hour meter', { exact: true }).fill('1204');
    const checklist = (await apiGet(page, `/organizations/${org}/machines/${machineId}/checklist`))
      .data as { items: { label: string }[] };
    for (const item of checklist.items)
      await page
        .getByRole('radiogroup', { name: item.label, exact: true })
        .getByRole('radio', { name: 'OK', exact: true })
        .check();

    const care = page.getByRole('region', { name: 'Daily care' });
    // 1,200 − 1,188 h: the round is past its 10 h
    await care.getByText('Last greased 12 h ago, every 10 h').waitFor();
    await care.getByText('Last done 5 h ago, every 10 h').waitFor();
    // each caution in full, on screen (not a hover), ending with the deferral
    expect(await care.getByRole('complementary', { name: /^Safety: / }).count()).toBe(2);
    expect(await care.getByRole('complementary').first().innerText()).toMatch(/operator's manual/);
    const tick = care.getByRole('checkbox', { name: `Greased: ${GREASE}` });
    // the whole row is the target, tall enough for a thumb
    const row = care
      .locator('label')
      .filter({ has: page.getByRole('checkbox', { name: `Greased: ${GREASE}` }) });
    expect((await row.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    await row.click();
    expect(await tick.isChecked()).toBe(true);
    expect(await care.getByRole('checkbox', { name: `Done: ${SEPARATOR}` }).isChecked()).toBe(
      false,
    );
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      PHONE_VIEWPORT.width,
    );
    await care.scrollIntoViewIfNeeded();
    await screenshot(page, 'daily-care-walkaround');

    await page.getByRole('button', { name: 'Send walkaround' }).click();
    await page.getByText('Walkaround sent').waitFor();
    const signed = page.getByRole('region', { name: 'Daily care signed off' });
    expect(await signed.innerText()).toContain(GREASE);
    expect(await signed.innerText()).not.toContain(SEPARATOR);
    await screenshot(page, 'daily-care-walkaround-sent');
    await page.close();
  });

  it('the machine page shows the grease round reset to 1,204 h today, the separator as it was; the dashboard counts one done today', async () => {
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    const tasks = (await apiGet(page, `/organizations/${org}/machines/${machineId}/tasks`))
      .data as Task[];
    const byName = new Map(tasks.map((t) => [t.name, t]));
    const today = todayIso(timeZone);
    expect([byName.get(GREASE)!.lastDoneMeter, byName.get(GREASE)!.lastDoneOn]).toEqual([
      1204,
      today,
    ]);
    expect(byName.get(SEPARATOR)!.lastDoneMeter).toBe(1195);

    await page.goto(`/o/${org}/machines/${machineId}`);
    await page.getByRole('heading', { name: new RegExp(`^${DAILY_CARE_FLEET} · `) }).waitFor();
    const cards = page.getByRole('list', { name: 'Service tasks' }).getByRole('listitem');
    const grease = cards.filter({ has: page.getByRole('heading', { name: GREASE }) });
    // outside the card's fold: the badge and when the walkaround last ticked it off
    await grease.getByText('Daily care', { exact: true }).waitFor();
    await grease.getByText(/ticked off in the walkaround — last done 1,204 h on /).waitFor();
    const separator = cards.filter({ has: page.getByRole('heading', { name: SEPARATOR }) });
    await separator.getByText(/ticked off in the walkaround — last done 1,195 h on /).waitFor();
    await screenshot(page, 'daily-care-machine-page');

    await page.goto(`/o/${org}`);
    const board = page.getByRole('region', { name: 'Daily care' });
    // one line of totals on the dashboard, the machines a tap away
    await board
      .getByText(/^\d+ done today$/)
      .first()
      .waitFor();
    await board.getByText(/^on \d+ machines?/).waitFor();
    await board.getByText(/^Daily care by machine \(\d+\)/).click();
    const machine = board
      .getByRole('list', { name: 'Daily care by machine' })
      .getByRole('listitem')
      .filter({ has: page.getByRole('link', { name: new RegExp(`^${DAILY_CARE_FLEET} · `) }) });
    await machine.getByText('1 done today').waitFor();
    await machine.getByText('1 not yet today').waitFor();
    await machine.getByText(SEPARATOR, { exact: false }).waitFor();
    await screenshot(page, 'daily-care-dashboard');
    await page.close();
  });
});
