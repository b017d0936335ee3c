// The hitch log in the browser (issue 13): an implement without a meter is hitched to a tractor on
// its page, a reading logged on the tractor gives it hours and moves its task's due point; the
// history fits a 390 px phone; a tractor's walkaround asks what is hitched, shows the server's
// refusal in its words, and records none and a new hitch. Every machine is the test's own
// (HITCH_FLEET).
//
// Hand-worked example (the rule of shared/domain/hitch-hours.ts): HX-01 reads 1,000 h two days ago
// and 1,010 h a day ago. HK-01 is hitched on its page ("Hitch now"): after HX-01's last reading,
// so nothing is known to have run yet (the last value holds: 0 h). The manager then corrects the
// start to the time of the 1,010 h reading (it went on when that reading was taken) — left at
// "now", the next reading's rise would be spread linearly over the whole day before it and HK-01
// would get only the last seconds' share. HX-01 then reads 1,016 h: HK-01 has 1,016 − 1,010 = 6 h.
// Its blade check, last done at 0 h with a 50 h interval, is due at 50 h: 44 h left.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { baseUrl, launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { HITCH_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';

const PASSWORD = 'hourstone-demo';
const PHONE = { width: 390, height: 844 } as const;
const DAY = 86_400_000;
const [TRACTOR, OTHER_TRACTOR, IMPLEMENT, OTHER_IMPLEMENT] = HITCH_FLEET;
/** when HX-01 read 1,010 h: a day ago, on a whole minute */
const READ_AT_1010 = new Date(Math.floor((Date.now() - DAY) / 60_000) * 60_000).toISOString();

interface Member {
  user: { id: string; email: string };
}

const taskCard = (page: Page) =>
  page
    .getByRole('list', { name: 'Service tasks' })
    .getByRole('listitem')
    .filter({ hasText: 'Blade check' });

describe('hitch log — an implement counts the tractor’s hours (browser)', () => {
  let browser: TestBrowser;
  let operatorBrowser: TestBrowser;
  let page: Page;
  let orgId: string;
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(PHONE);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    orgId = (await larkspurFarm(page)).id;
    const members = (
      await (await page.request.get(`/api/v1/organizations/${orgId}/members`)).json()
    ).data as Member[];
    const lena = members.find((m) => m.user.email === 'lena@larkspur.example')!.user.id;
    ids[TRACTOR] = await addOwnMachine(
      page,
      orgId,
      {
        fleetNumber: TRACTOR,
        name: 'Hitch test tractor',
        category: 'tractor',
        operatorIds: [lena],
      },
      [{ agoMs: 2 * DAY, value: 1000 }],
    );
    const second = await page.request.post(
      `/api/v1/organizations/${orgId}/machines/${ids[TRACTOR]}/readings`,
      { data: { value: 1010, takenAt: READ_AT_1010 } },
    );
    expect(second.status()).toBe(201);
    ids[OTHER_TRACTOR] = await addOwnMachine(page, orgId, {
      fleetNumber: OTHER_TRACTOR,
      name: 'Second hitch test tractor',
      category: 'tractor',
    });
    ids[IMPLEMENT] = await addOwnMachine(page, orgId, {
      fleetNumber: IMPLEMENT,
      name: 'Test flail mower',
      category: 'implement',
      operatorIds: [lena],
    });
    ids[OTHER_IMPLEMENT] = await addOwnMachine(page, orgId, {
      fleetNumber: OTHER_IMPLEMENT,
      name: 'Test tedder',
      category: 'implement',
      operatorIds: [lena],
    });
    const task = await page.request.post(
      `/api/v1/organizations/${orgId}/machines/${ids[IMPLEMENT]}/tasks`,
      { data: { name: 'Blade check', intervalMeter: 50 } },
    );
    expect(task.status()).toBe(201);
    const lastDone = await page.request.put(
      `/api/v1/organizations/${orgId}/tasks/${(await task.json()).data.id}/last-done`,
      {
        data: {
          lastDoneMeter: 0,
          lastDoneOn: new Date(Date.now() - DAY).toISOString().slice(0, 10),
        },
      },
    );
    expect(lastDone.status()).toBe(200);
  });

  afterAll(async () => {
    await browser?.close();
    await operatorBrowser?.close();
  });

  it('390 px — hitch HK-01 to HX-01 on its page, log HX-01 at 1,016 h: HK-01 has 6 h and its task 44 h left', async () => {
    await page.goto(`${baseUrl}/o/${orgId}/machines/${ids[IMPLEMENT]}`);
    await page.getByRole('heading', { name: new RegExp(`^${IMPLEMENT} · `) }).waitFor();
    const hours = page.getByTestId('hitch-hours');
    expect(await hours.innerText()).toMatch(/^0(\.0)? h$/);
    await taskCard(page).waitFor();
    const dueBefore = await taskCard(page).innerText();
    expect(dueBefore).not.toContain('44 h left');

    await page
      .getByLabel('Tractor', { exact: true })
      .selectOption({ label: `${TRACTOR} · Hitch test tractor` });
    await page.getByRole('button', { name: 'Hitch now' }).click();
    await page.getByRole('button', { name: `Unhitch from ${TRACTOR}` }).waitFor();
    await page.getByText(new RegExp(`On ${TRACTOR} Hitch test tractor since`)).waitFor();
    expect(await hours.innerText()).toMatch(/^0(\.0)? h$/);

    // the correction: it went on when the 1,010 h reading was taken
    const log = await page.request.get(
      `/api/v1/organizations/${orgId}/machines/${ids[IMPLEMENT]}/hitch-spans`,
    );
    const spanId = (await log.json()).data.spans[0].id as string;
    const corrected = await page.request.patch(
      `/api/v1/organizations/${orgId}/hitch-spans/${spanId}`,
      { data: { startedAt: READ_AT_1010 } },
    );
    expect(corrected.status()).toBe(200);

    await page.goto(`${baseUrl}/o/${orgId}/machines/${ids[TRACTOR]}`);
    const form = page.getByRole('form', { name: 'Log a reading' });
    await form.getByLabel('Meter reading').fill('1016');
    await form.getByRole('button', { name: 'Save reading' }).click();
    // the tractor's page refreshes what it pulls once the reading is saved
    await page
      .getByRole('list', { name: 'Pulling now' })
      .getByText(new RegExp(`${IMPLEMENT} .*\\(6(\\.0)? h so far\\)`))
      .waitFor();

    await page.goto(`${baseUrl}/o/${orgId}/machines/${ids[IMPLEMENT]}`);
    await page.getByRole('heading', { name: new RegExp(`^${IMPLEMENT} · `) }).waitFor();
    expect(await page.getByTestId('hitch-hours').innerText()).toMatch(/^6(\.0)? h$/);
    await taskCard(page).getByText('Due 50 h — 44 h left').waitFor();

    // the history is a card per span on the phone, nothing wider than the screen
    const history = page.getByRole('list', { name: 'Hitch history' });
    expect(await history.getByRole('listitem').count()).toBe(1);
    expect(await history.innerText()).toContain('Still hitched');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      PHONE.width,
    );
    await history.scrollIntoViewIfNeeded();
    await screenshot(page, 'hitch-implement-phone');
  });

  it("walkaround on HX-01 — lena says what is hitched: HK-02 is refused in the server's words, then none, then HK-01", async () => {
    // HK-02 is on the other tractor, still hitched
    const elsewhere = await page.request.post(`/api/v1/organizations/${orgId}/hitch-spans`, {
      data: { implementId: ids[OTHER_IMPLEMENT], tractorId: ids[OTHER_TRACTOR] },
    });
    expect(elsewhere.status()).toBe(201);

    // a browser of its own: signing lena in must not sign marta out
    operatorBrowser = await launchBrowser();
    const lena = await operatorBrowser.newPage(PHONE);
    await signIn(lena, 'lena@larkspur.example', PASSWORD);
    await lena.goto(`${baseUrl}/o/${orgId}/walkaround/${ids[TRACTOR]}`);
    await lena.getByRole('heading', { name: `Walkaround · ${TRACTOR}` }).waitFor();
    const hitch = lena.getByRole('form', { name: 'Hitched implement' });
    const choice = hitch.getByLabel('Implement hitched now');
    await choice.waitFor();
    expect(await choice.inputValue()).toBe(ids[IMPLEMENT]);

    await choice.selectOption({ label: `${OTHER_IMPLEMENT} · Test tedder` });
    await hitch.getByRole('button', { name: 'Save hitch' }).click();
    const refusal = hitch.getByRole('alert');
    await refusal.waitFor();
    const words = (await refusal.innerText()).replace(/\s+/g, ' ');
    expect(words).toContain(`${OTHER_IMPLEMENT} is on ${OTHER_TRACTOR} from`);
    expect(words).toContain('an implement is on one tractor at a time');
    await screenshot(lena, 'hitch-walkaround-refused');
    // nothing changed: HK-01 is still on HX-01
    const log = async (machineId: string) =>
      (
        await (
          await page.request.get(`/api/v1/organizations/${orgId}/machines/${machineId}/hitch-spans`)
        ).json()
      ).data.spans as { implement: { id: string }; endedAt: string | null }[];
    expect(
      (await log(ids[TRACTOR])).filter((s) => s.endedAt === null).map((s) => s.implement.id),
    ).toEqual([ids[IMPLEMENT]]);

    await choice.selectOption({ label: 'None' });
    await hitch.getByRole('button', { name: 'Save hitch' }).click();
    await hitch.getByRole('status').getByText(`Recorded: nothing on ${TRACTOR} now.`).waitFor();
    expect((await log(ids[TRACTOR])).filter((s) => s.endedAt === null)).toEqual([]);

    await choice.selectOption({ label: `${IMPLEMENT} · Test flail mower` });
    await hitch.getByRole('button', { name: 'Save hitch' }).click();
    await hitch.getByRole('status').getByText(`Recorded: ${IMPLEMENT} on ${TRACTOR}`).waitFor();
    const open = (await log(ids[TRACTOR])).filter((s) => s.endedAt === null);
    expect(open.map((s) => s.implement.id)).toEqual([ids[IMPLEMENT]]);
    // the checklist is still there to walk
    await lena.getByRole('button', { name: 'Send walkaround' }).waitFor();
  });
});
