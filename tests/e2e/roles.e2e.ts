import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  PHONE_VIEWPORT,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
  type Viewport,
} from './support/browser';

const PASSWORD = 'hourstone-demo';
const DESKTOP: Viewport = { width: 1280, height: 800 };

// What each demo role is offered in the main navigation (SCENARIO.md people), most used first:
// on a phone the first four are in the bottom bar and the rest behind "More".
const MANAGER_NAV = [
  'Dashboard',
  'Fleet',
  'Log hours',
  'Defects',
  'Shop week',
  'Season hours',
  'Bookings',
  'Team',
  'Dealers',
  'Reminders',
  'Messages',
  'Checklists',
  'Walkaround',
  'Settings',
  'Account',
] as const;

const ROLES = [
  {
    who: 'marta@larkspur.example',
    role: 'manager',
    org: 'Larkspur Flats Farm',
    nav: MANAGER_NAV,
  },
  {
    who: 'dev@larkspur.example',
    role: 'technician',
    org: 'Larkspur Flats Farm',
    nav: [
      'Dashboard',
      'Shop week',
      'Defects',
      'Fleet',
      'Log hours',
      'Walkaround',
      'Season hours',
      'Bookings',
      'Reminders',
      'Account',
    ],
  },
  {
    who: 'lena@larkspur.example',
    role: 'operator',
    org: 'Larkspur Flats Farm',
    nav: [
      'Walkaround',
      'Log hours',
      'Fleet',
      'Dashboard',
      'Defects',
      'Season hours',
      'Reminders',
      'Account',
    ],
  },
  {
    who: 'aoife@osiercreek.example',
    role: 'manager',
    org: 'Osier Creek Dairy',
    nav: MANAGER_NAV,
  },
  {
    who: 'ravi@quillon.example',
    role: 'advisor',
    org: 'Quillon Equipment & Service',
    nav: ['Dashboard', 'Parts forecast', 'Bookings', 'Customers', 'Settings', 'Account'],
  },
] as const;

/** Opens the phone bar's "More" panel, when there is one, so every item is a link on the page. */
async function openMore(page: Page) {
  const more = page.getByRole('navigation', { name: 'Main' }).getByRole('button', { name: 'More' });
  if ((await more.count()) === 0) return;
  if ((await more.getAttribute('aria-expanded')) !== 'true') await more.click();
  await page.locator(`[id="${await more.getAttribute('aria-controls')}"]`).waitFor();
}

async function navLabels(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await nav.waitFor({ state: 'visible', timeout: 15000 });
  await openMore(page);
  const links = nav.getByRole('link');
  const labels: string[] = [];
  for (let i = 0; i < (await links.count()); i++)
    labels.push((await links.nth(i).innerText()).trim());
  return labels;
}

async function signOut(page: Page) {
  await openMore(page);
  const account = page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: 'Account' });
  await account.click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname.startsWith('/sign-in'));
}

describe('sign-in and navigation by role (browser)', () => {
  let browser: TestBrowser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('sign-in — a wrong password shows the server message and stays on the sign-in page', async () => {
    const page = await browser.newPage(DESKTOP);
    await page.goto('/sign-in');
    await page.getByLabel('Email', { exact: true }).fill('marta@larkspur.example');
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const alert = page.getByRole('alert');
    await alert.waitFor({ state: 'visible' });
    expect(await alert.innerText()).toMatch(/do not match an account/);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.close();
  });

  for (const viewport of [DESKTOP, PHONE_VIEWPORT]) {
    const label = viewport === DESKTOP ? 'desktop' : 'phone';
    for (const r of ROLES) {
      it(`${label} — ${r.role} ${r.who} sees ${r.nav.join(', ')}`, async () => {
        const page = await browser.newPage(viewport);
        await signIn(page, r.who, PASSWORD);
        expect(await navLabels(page)).toEqual([...r.nav]);
        await page.locator('main').getByText(r.org).first().waitFor({ state: 'visible' });
        await screenshot(page, `roles-${label}-${r.role}-${r.who.split('@')[0]}`);
        await signOut(page);
        await page.close();
      });
    }
  }

  it('protected page while signed out — goes to sign-in and back after', async () => {
    const page = await browser.newPage(DESKTOP);
    await page.goto('/o/00000000-0000-0000-0000-000000000000/team');
    await page.waitForURL((url) => url.pathname.startsWith('/sign-in'));
    expect(new URL(page.url()).searchParams.get('next')).toContain('/team');
    await page.close();
  });
});
