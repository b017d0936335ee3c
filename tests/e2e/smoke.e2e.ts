import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, type TestBrowser } from './support/browser';

describe('smoke — the built app in chromium', () => {
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('the base URL, signed out — shows the sign-in page', async () => {
    const page = await browser.newPage();
    const response = await page.goto(baseUrl);
    expect(response?.status()).toBe(200);
    const heading = page.getByRole('heading', { name: /sign in/i });
    await heading.first().waitFor({ state: 'visible', timeout: 15000 });
    expect(await heading.count()).toBeGreaterThan(0);
  });
});
