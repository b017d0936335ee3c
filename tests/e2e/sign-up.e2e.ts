import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, type TestBrowser } from './support/browser';

// A newcomer with nothing in Hourstone: signs up from the sign-in page, confirms the address
// through the e-mail the worker delivers to the mail catcher, sets up a farm and lands on its
// empty dashboard. A fresh address per run, so the demo the other files use is not touched.
const ADDRESS = `newcomer-${Date.now()}@tallowmere.example`;
const FARM = 'Tallowmere Farm';

describe('sign-up — from the sign-in page to an empty farm of one’s own', () => {
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('sign up, confirm through the caught mail, create a farm — its dashboard is empty and the switcher shows it', async () => {
    const page = await browser.newPage();
    await page.context().clearCookies();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByRole('heading', { name: 'Create your account' }).waitFor();
    await page.getByLabel('Your name').fill('Petra Lindqvist');
    await page.getByLabel('Email', { exact: true }).fill(ADDRESS);
    await page.getByLabel('Password', { exact: true }).fill('a-long-newcomer-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Check your e-mail').waitFor();

    await page.goto(`${baseUrl}/dev/mail`);
    const message = page
      .getByRole('list', { name: 'Caught mail' })
      .getByRole('link')
      .filter({ hasText: 'Confirm your e-mail address for Hourstone' })
      .filter({ hasText: ADDRESS })
      .first();
    await message.waitFor({ timeout: 30_000 });
    await message.click();
    await page.getByText('Plain text', { exact: true }).click();
    const href = await page
      .getByRole('link', { name: /\/verify-email\?token=/ })
      .getAttribute('href');
    expect(href).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/verify-email\?token=[\w-]+$/);

    await page.goto(href!);
    await page.getByRole('button', { name: 'Confirm and continue' }).click();
    await page.getByRole('heading', { name: 'Set up your farm or dealer' }).waitFor();
    const browserZone = await page.evaluate(() => Intl.DateTimeFormat().resolvedOptions().timeZone);
    expect(await page.getByLabel('Time zone').inputValue()).toBe(browserZone);
    await page.getByLabel('Name', { exact: true }).fill(FARM);
    await page.getByLabel('Currency').selectOption('EUR');
    await page.getByLabel('Labour rate per hour (EUR)').fill('48.50');
    await page.getByRole('checkbox', { name: 'April' }).check();
    await screenshot(page, 'sign-up-new-farm');
    await page.getByRole('button', { name: 'Create' }).click();

    await page.waitForURL(/\/o\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Dashboard' }).waitFor();
    // an empty farm's dashboard says how to bring the fleet in, not "choose a longer horizon"
    const heading = page.getByRole('heading', { name: 'No machines yet' });
    await heading.waitFor();
    expect(await page.getByText(/Nothing due in \d+ days|choose a longer horizon/).count()).toBe(0);
    // the innermost box around that heading (the due list's empty state) offers both ways in
    const empty = page.locator('div', { has: heading }).last();
    await empty.getByRole('link', { name: 'Add a machine' }).waitFor();
    await empty.getByRole('link', { name: 'Import machines' }).waitFor();
    const switcher = page.getByRole('combobox', { name: 'Organization' });
    expect(await switcher.locator('option:checked').textContent()).toContain(FARM);
    await screenshot(page, 'sign-up-empty-dashboard');

    // the settings hold what was chosen
    await page.getByRole('link', { name: 'Settings' }).first().click();
    await page.getByRole('heading', { name: 'Settings' }).waitFor();
    expect(await page.getByLabel('Labour rate per hour (EUR)').inputValue()).toBe('48.50');
    expect(await page.getByRole('checkbox', { name: 'April' }).isChecked()).toBe(true);
  });
});
