import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';

// The reading import of a large file (issue 12) in the browser: the page shows how much of the
// file is sent while it goes up (the upload throttled to 512 kB/s through Chromium's DevTools
// protocol, so the bar is seen part way), then the preview counts every row and says it lists only
// some. The file repeats a stored reading and only the check runs, so nothing is written.
const DESKTOP = { width: 1280, height: 800 };
const ROWS = 60_000;

interface Latest {
  machine: { id: string; fleetNumber: string; status: string };
  /** value: on the meter fitted now */
  lastReading: { value: number; takenAt: string } | null;
}

async function larkspur(page: Page) {
  const me = await (await page.request.get('/api/v1/me')).json();
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
  ).organization.id as string;
}

describe('reading import — a large file in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  let errors: string[];
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    errors = collectPageErrors(page);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('import — a 60,000-row file shows its upload progress, then every row checked and the first listed', async () => {
    const org = await larkspur(page);
    const latest = (
      await (await page.request.get(`/api/v1/organizations/${org}/readings/latest`)).json()
    ).data as Latest[];
    // A machine whose last reading is on a whole second (CSV times are read to the second), and
    // that reading 60,000 times over: every row an identical repeat, so nothing would be written.
    const m = latest.find(
      (l) =>
        l.lastReading &&
        l.machine.status === 'in_service' &&
        /:\d{2}(\.000)?Z$/.test(l.lastReading.takenAt),
    )!;
    const row = `${m.machine.fleetNumber},${m.lastReading!.takenAt},${m.lastReading!.value}`;
    const lines = ['fleet number,taken at,value', ...Array.from({ length: ROWS }, () => row)];
    const csv = Buffer.from(`${lines.join('\n')}\n`);

    await page.goto('/');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Log hours' })
      .click();
    await page.getByRole('link', { name: 'Import a CSV file' }).click();
    await page.getByRole('heading', { name: 'Import readings' }).waitFor();
    await page
      .getByLabel('CSV file')
      .setInputFiles({ name: 'big.csv', mimeType: 'text/csv', buffer: csv });

    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 0,
      downloadThroughput: -1,
      uploadThroughput: 512 * 1024,
    });
    await page.getByRole('button', { name: 'Check file' }).click();
    const bar = page.getByRole('progressbar', { name: 'Sending big.csv' });
    await bar.waitFor();
    await page
      .getByRole('status')
      .filter({ hasText: /Sending and reading big\.csv: \d+ %/ })
      .waitFor();
    await screenshot(page, 'import-progress-sending');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 0,
      downloadThroughput: -1,
      uploadThroughput: -1,
    });

    await page
      .getByText(
        `${ROWS.toLocaleString('en-US')} rows checked: 0 new, 60,000 already there. There is nothing new to import.`,
      )
      .waitFor({ timeout: 60_000 })
      .catch(async (error) => {
        await screenshot(page, 'import-progress-failed');
        throw error;
      });
    expect(await page.getByRole('progressbar', { name: 'Sending big.csv' }).count()).toBe(0);
    const main = await page.locator('main').innerText();
    expect(main).toMatch(
      /Every row was checked\. Listed below: the first rows of the file and its first errors, 200 of 60,000 rows\./,
    );
    expect(await page.getByRole('button', { name: 'Import 0 readings' }).isDisabled()).toBe(true);
    await screenshot(page, 'import-progress-checked');
    expect(errors).toEqual([]);
  }, 120_000);
});
