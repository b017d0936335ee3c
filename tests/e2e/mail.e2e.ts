import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, type TestBrowser } from './support/browser';

// Requests only queue their e-mail; the worker that scripts/test.mjs starts beside the API
// delivers it to the mail catcher. The reset link is opened but not used, so the demo password
// the other browser tests sign in with stays as it is.
const ADDRESS = 'dev@larkspur.example';

describe('e-mail through the outbox — the worker delivers what a request queued', () => {
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('forgot password — the reset e-mail arrives in Caught mail and its link opens the new-password form', async () => {
    const page = await browser.newPage();
    await page.context().clearCookies();
    await page.goto(`${baseUrl}/forgot-password`);
    await page.getByLabel('Email', { exact: true }).fill(ADDRESS);
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByText('Check your e-mail').waitFor();

    await page.goto(`${baseUrl}/dev/mail`);
    // the page refreshes the list every few seconds; the message is there once delivered
    const message = page
      .getByRole('list', { name: 'Caught mail' })
      .getByRole('link')
      .filter({ hasText: 'Reset your Hourstone password' })
      .filter({ hasText: ADDRESS })
      .first();
    await message.waitFor({ timeout: 30_000 });
    await message.click();
    await page.getByText('Plain text', { exact: true }).click();
    const link = page.getByRole('link', { name: /\/reset-password\?token=/ });
    const href = await link.getAttribute('href');
    expect(href).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/reset-password\?token=[\w-]+/);
    await screenshot(page, 'caught-reset-mail');

    await page.goto(href!);
    await page.getByRole('heading', { name: 'Set a new password' }).waitFor();
    expect(await page.getByLabel('New password').count()).toBe(1);
  });
});
