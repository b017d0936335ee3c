// Issue 17, Season hours, in the browser: the demo manager opens Season hours from the farm's
// navigation and reads a demo combine's figures (C-01, harvest August–October) as the API gives
// them; she plans next season for a tractor of her own (SH-01, written by no other file) by area
// and work rate — a work rate of 0 is refused beside its field, 300 ha at 4 ha/h is worked out as
// 75 h (hours = area ÷ rate, shared/domain/season-use.ts) — and the card shows the plan's hours;
// the form and the card say that on this all-year machine next year's plan counts only from 1 January.
// A technician reads the plan but is offered no way to change it, and the API refuses him (403).
// The page fits a 390 px phone without sideways scrolling, its controls 44 px high.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { SeasonHoursRow } from '../../shared/schemas/season-hours';
import {
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { SEASON_HOURS_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';
import { apiGet } from './support/role-flows-api';
import { fitProblems, settle } from './support/screen-checks';

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 800 };
const PHONE = { width: 390, height: 844 };
const DAY = 86_400_000;
const COMBINE = 'C-01';
// the browser formats figures as the app does (en-US in the test's chromium): "1,234.5 h"
const hours = (value: number) =>
  `${new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 }).format(value)} h`;

const rowsOf = async (page: Page, org: string, year: number) =>
  (await apiGet(page, `/organizations/${org}/season-hours?year=${year}`)).data as SeasonHoursRow[];

describe('season hours — the season so far against last season, and a plan that feeds the forecast', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let tractorId: string;
  let thisYear: number;

  const card = (on: Page, fleetNumber: string) =>
    on
      .getByRole('list', { name: 'Season hours by machine' })
      .getByRole('listitem')
      .filter({ has: on.getByRole('heading', { name: new RegExp(`^${fleetNumber} · `) }) });

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    org = (await larkspurFarm(page)).id;
    tractorId = await addOwnMachine(
      page,
      org,
      {
        fleetNumber: SEASON_HOURS_FLEET,
        name: 'Season tractor',
        category: 'tractor',
        meterUnit: 'h',
      },
      [
        { agoMs: 400 * DAY, value: 900 },
        { agoMs: 300 * DAY, value: 1000 },
        { agoMs: 20 * DAY, value: 1300 },
        { agoMs: 60_000, value: 1340 },
      ],
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the manager opens Season hours from the navigation and reads the combine’s figures', async () => {
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}`);
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Season hours' })
      .click();
    await page.getByRole('heading', { name: 'Season hours', level: 1 }).waitFor();
    await page.getByText(/feeds the machine.s forecast/).waitFor();
    const checked = page.getByRole('radio', { name: /\(this year\)$/ });
    expect(await checked.isChecked()).toBe(true);
    thisYear = Number((await checked.getAttribute('value')) ?? 0);

    const combine = card(page, COMBINE);
    await combine.waitFor();
    const row = (await rowsOf(page, org, thisYear)).find((r) => r.machine.fleetNumber === COMBINE)!;
    // the demo's combine works in harvest, so last season has hours to compare with
    expect(row.lastSeason).toBeGreaterThan(0);
    const text = await combine.innerText();
    expect(text).toContain('Season: Aug–Oct');
    expect(text).toMatch(new RegExp(`This season so far\\s*${hours(row.thisSeason)}`));
    expect(text).toMatch(
      new RegExp(`Last season to the same date\\s*${hours(row.lastSeasonToDate)}`),
    );
    expect(text).toMatch(new RegExp(`Last season in full\\s*${hours(row.lastSeason)}`));
    expect(await card(page, SEASON_HOURS_FLEET).innerText()).toContain('Season: All year');
    await screenshot(page, 'season-hours');
    expect(errors).toEqual([]);
  });

  it('plans next season by area and work rate: 0 h⁻¹ refused beside the field, 300 ha at 4 ha/h is 75 h', async () => {
    // the chips are labels around visually hidden radios: a person taps the label
    await page.locator('label', { hasText: '(next year)' }).click();
    await page.waitForURL(/year=/);
    const next = thisYear + 1;
    const tractor = card(page, SEASON_HOURS_FLEET);
    await tractor.getByText(`No plan for ${next}.`).waitFor();
    await tractor.getByRole('button', { name: 'Plan season' }).click();
    const form = tractor.getByRole('form', { name: `Plan the ${next} season of SH-01` });
    // SH-01 works all year, so its season is the calendar year (planYear, season-use.ts): a plan
    // for next year counts only from 1 January — said where the plan is entered (en-US date)
    const startsOn = `only from Jan 1, ${next}. Until then its due dates go by ${thisYear}.`;
    expect(await form.innerText()).toContain(
      `This machine works all year, so its season is the calendar year: a ${next} plan counts in its forecast ${startsOn}`,
    );
    await form.locator('label', { hasText: 'Area and work rate' }).click();
    expect(await form.getByRole('radio', { name: 'Area and work rate' }).isChecked()).toBe(true);
    await form.getByLabel('Planned area').fill('300');
    await form.getByLabel('Area unit').selectOption('ha');
    const rate = form.getByLabel('Work rate (area per hour)');
    await rate.fill('0');
    await form.getByRole('button', { name: 'Save plan' }).click();
    await expect.poll(() => rate.getAttribute('aria-invalid')).toBe('true');
    expect(await form.innerText()).toMatch(/Work rate/);

    await rate.fill('4');
    await form.getByText('Worked out: 75 h for the season.').waitFor();
    await form.getByRole('button', { name: 'Save plan' }).click();
    await form.waitFor({ state: 'detached' });
    await tractor.getByText(`comes to 75 h`, { exact: false }).waitFor();
    expect(await tractor.innerText()).toMatch(new RegExp(`Plan for ${next}\\s*75 h`));
    expect(await tractor.innerText()).toContain(startsOn);

    const plan = (await rowsOf(page, org, next)).find((r) => r.machine.id === tractorId)!.plan;
    expect(plan).toMatchObject({ year: next, area: 300, areaUnit: 'ha', areaPerHour: 4 });
    expect(plan!.plannedUse).toBe(75);
    await screenshot(page, 'season-hours-planned');
  });

  it('fits a 390 px phone: no sideways scroll, every button and choice 44 px high', async () => {
    const phone = await browser.newPage(PHONE);
    await phone.goto(`/o/${org}/season-hours?year=${thisYear + 1}`);
    await settle(phone);
    await card(phone, SEASON_HOURS_FLEET).getByRole('button', { name: 'Change plan' }).waitFor();
    expect(await fitProblems(phone, [])).toEqual([]);
    const heights = await phone
      .locator('main :is(button, label:has(input[type=radio]))')
      .evaluateAll((els) => els.map((el) => el.getBoundingClientRect().height));
    expect(heights.length).toBeGreaterThan(3);
    expect(heights.filter((h) => h < 44)).toEqual([]);
    await screenshot(phone, 'season-hours-phone');
    await phone.close();
  });

  it('a technician reads the plan but cannot change it; the API refuses him', async () => {
    await signIn(page, 'dev@larkspur.example', PASSWORD);
    const next = thisYear + 1;
    await page.goto(`/o/${org}/season-hours?year=${next}`);
    const tractor = card(page, SEASON_HOURS_FLEET);
    await tractor.getByText(`comes to 75 h`, { exact: false }).waitFor();
    expect(
      await page.getByRole('button', { name: /Plan season|Change plan|Remove plan/ }).count(),
    ).toBe(0);
    const put = await page.request.put(
      `/api/v1/organizations/${org}/machines/${tractorId}/season-plans/${next}`,
      { data: { value: 10 } },
    );
    expect(put.status()).toBe(403);
  });

  it('the manager removes the plan; the card says there is none', async () => {
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    const next = thisYear + 1;
    await page.goto(`/o/${org}/season-hours?year=${next}`);
    const tractor = card(page, SEASON_HOURS_FLEET);
    await tractor.getByRole('button', { name: 'Remove plan' }).click();
    const dialog = page.getByRole('dialog', { name: `Remove the ${next} plan of SH-01?` });
    await dialog.getByRole('button', { name: 'Remove plan' }).click();
    await tractor.getByText(`No plan for ${next}.`).waitFor();
    const row = (await rowsOf(page, org, next)).find((r) => r.machine.id === tractorId)!;
    expect(row.plan).toBeNull();
  });
});
