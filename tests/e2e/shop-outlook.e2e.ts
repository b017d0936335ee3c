// The shop's next 16 weeks (issue 17) in the browser: the demo farm's technician opens the shop
// week and finds, below it, one row per week with the services coming due, the forecast labour
// and the planned labour the API gives; a week's row opens its list of services; on a 390 px
// phone nothing scrolls sideways. Reads only: it writes nothing to the demo.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { ShopOutlook } from '../../shared/schemas/shop-outlook';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { larkspurFarm } from './support/demo-fleet';

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 800 } as const;
/** The phone the brief names. */
const PHONE = { width: 390, height: 844 } as const;

const count = (n: number, one: string) => `${n} ${n === 1 ? one : `${one}s`}`;

async function openShop(page: Page) {
  await signIn(page, 'dev@larkspur.example', PASSWORD);
  const farm = await larkspurFarm(page);
  const res = await page.request.get(`/api/v1/organizations/${farm.id}/shop-outlook`);
  expect(res.status()).toBe(200);
  const outlook = (await res.json()).data as ShopOutlook;
  await page.goto(`/o/${farm.id}/shop`);
  await page.getByRole('heading', { name: 'Next 16 weeks' }).waitFor();
  const weeks = page.getByRole('list', { name: 'Weeks ahead' }).locator(':scope > li');
  await weeks.first().waitFor();
  return { outlook, weeks };
}

/** Whether the page is wider than its window (a sideways scroll). */
const scrollsSideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);

describe('shop outlook — the technician sees the next 16 weeks (browser)', () => {
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('technician — 16 week rows with the services and hours of the API; a week opens its services', async () => {
    const page = await browser.newPage(DESKTOP);
    const { outlook, weeks } = await openShop(page);
    expect(await weeks.count()).toBe(16);
    for (const [i, week] of outlook.weeks.entries()) {
      const text = (await weeks.nth(i).getByRole('button').innerText()).replace(/\s+/g, ' ');
      expect(text, week.isoWeek).toContain(count(week.services.length, 'service'));
      expect(text, week.isoWeek).toMatch(/forecast [\d.,]+ h/);
      expect(text, week.isoWeek).toMatch(/planned [\d.,]+ h/);
    }
    // the demo farm has work coming due: the first week with services opens its list
    const busy = outlook.weeks.findIndex((w) => w.services.length > 0);
    expect(busy).toBeGreaterThanOrEqual(0);
    const row = weeks.nth(busy);
    const toggle = row.getByRole('button');
    expect(await toggle.getAttribute('aria-expanded')).toBe('false');
    await toggle.click();
    expect(await toggle.getAttribute('aria-expanded')).toBe('true');
    const services = row.getByRole('list', { name: /^Services coming due/ }).locator(':scope > li');
    await services.first().waitFor();
    expect(await services.count()).toBe(outlook.weeks[busy].services.length);
    const first = outlook.weeks[busy].services[0];
    expect(await services.first().innerText()).toContain(first.taskName);
    expect(await services.first().innerText()).toContain(first.machine.fleetNumber);
    await screenshot(page, 'shop-outlook-technician');
    await page.close();
  });

  it('phone 390 px — the weeks and an opened week fit without a sideways scroll', async () => {
    const page = await browser.newPage(PHONE);
    const { outlook, weeks } = await openShop(page);
    expect(await scrollsSideways(page)).toBe(false);
    const busy = outlook.weeks.findIndex((w) => w.services.length > 0);
    await weeks.nth(busy).getByRole('button').click();
    await weeks
      .nth(busy)
      .getByRole('list', { name: /^Services coming due/ })
      .waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, 'shop-outlook-phone');
    await page.close();
  });
});
