import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 860 };

describe('server restarting, and the farm export button (browser)', () => {
  let browser: TestBrowser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('dashboard — the due list answers 503 twice — "Trying again" shows, then the list loads by itself', async () => {
    const page = await browser.newPage(DESKTOP);
    let refused = 0;
    // The API's own answer while PostgreSQL restarts (error-handler.ts), for the first two reads.
    await page.route(/\/api\/v1\/organizations\/[^/]+\/due(\?|$)/, async (route) => {
      if (refused >= 2) return route.continue();
      refused++;
      await route.fulfill({
        status: 503,
        headers: { 'Retry-After': '1', 'Content-Type': 'application/json' },
        body: JSON.stringify({
          error: {
            code: 'unavailable',
            message: "Hourstone's database is not answering right now",
          },
        }),
      });
    });
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    const banner = page.getByRole('status').filter({ hasText: 'Trying again' });
    await banner.waitFor({ state: 'visible' });
    await screenshot(page, 'reconnecting-banner');
    await banner.waitFor({ state: 'hidden' });
    expect(refused).toBe(2);
    expect(await page.getByText(/database is not answering/).count()).toBe(0);
    await page.close();
  });

  it('settings page — the manager has "Download the farm’s data" (a link to the export); a technician has not', async () => {
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    await page.getByRole('link', { name: 'Settings' }).first().click();
    // Its own section (the delete card offers the same download again, further down).
    const download = page
      .getByRole('region', { name: 'Your farm’s data' })
      .getByRole('link', { name: 'Download the farm’s data' });
    await download.waitFor({ state: 'visible' });
    const href = (await download.getAttribute('href')) ?? '';
    const orgId = /^\/api\/v1\/organizations\/([0-9a-f-]{36})\/export$/.exec(href)?.[1];
    expect(orgId).toBeDefined();
    await screenshot(page, 'settings-farm-export');

    // The page itself is reachable by its address, whatever the technician's menu offers.
    await signIn(page, 'dev@larkspur.example', PASSWORD);
    await page.goto(`/o/${orgId}/settings`);
    await page.getByRole('heading', { name: 'Settings', level: 1 }).waitFor({ state: 'visible' });
    expect(await page.getByRole('link', { name: 'Download the farm’s data' }).count()).toBe(0);
    await page.close();
  });
});
