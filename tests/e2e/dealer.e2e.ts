import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { addDays, format, parseISO } from 'date-fns';
import {
  PHONE_VIEWPORT,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';

// The demo's dealer service advisor (SCENARIO.md: Quillon Equipment & Service, linked to Larkspur
// Flats with service access and Osier Creek with view access) in the browser. This file only adds
// a booking proposal: the other browser tests rely on the rest of the demo data as loaded. Each
// test starts from the dashboard, so none needs another to have run first.
const DESKTOP = { width: 1280, height: 800 };

async function boardTable(page: Page) {
  const table = page.getByRole('table', { name: 'Services coming due across customers' });
  await table.waitFor();
  return table;
}

/** The board, filtered to one customer once its answer is on screen. */
async function boardOf(page: Page, customer: string) {
  await page.goto('/');
  await page.getByRole('link', { name: 'Open the board' }).click();
  await page.getByRole('heading', { name: 'Coming due', level: 1 }).waitFor();
  await page.getByLabel('Customer').selectOption({ label: customer });
  await page.waitForURL((url) => url.searchParams.has('customer'));
  // the previous page stays on screen (marked busy) until the filtered answer arrives
  await page.waitForFunction((name) => {
    const cells = [...document.querySelectorAll('tbody tr td:nth-child(3)')];
    return cells.length > 0 && cells.every((c) => c.textContent?.startsWith(name));
  }, customer);
}

async function customerColumn(page: Page) {
  const table = await boardTable(page);
  return (await table.locator('tbody tr td:nth-child(3)').allInnerTexts()).join('\n');
}

describe('dealer board — the demo service advisor in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'ravi@quillon.example', 'hourstone-demo');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('board — the dashboard shows machines coming due at Larkspur Flats and Osier Creek', async () => {
    await page.goto('/');
    await page.getByRole('heading', { name: 'Coming due' }).waitFor();
    const customers = await customerColumn(page);
    expect(customers).toContain('Larkspur Flats Farm');
    expect(customers).toContain('Osier Creek Dairy');
    const overdue = page.getByRole('button', { name: /^Overdue:? \d+/ });
    expect(Number((await overdue.innerText()).match(/\d+/)![0])).toBeGreaterThan(0);
    expect(await (await boardTable(page)).innerText()).toMatch(
      /read (today|yesterday|\d+ days ago)/,
    );
    await screenshot(page, 'dealer-dashboard-desktop');
  });

  it('board — filters by customer, and the CSV download carries the same filter', async () => {
    await boardOf(page, 'Osier Creek Dairy');
    const customers = (await customerColumn(page)).split('\n').filter(Boolean);
    expect(customers.some((c) => c.startsWith('Larkspur'))).toBe(false);

    const href = await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href');
    expect(href).toContain('/board.csv?');
    expect(href).toContain('customerId=');
    const csv = await page.request.get(href!);
    expect(csv.status()).toBe(200);
    expect(csv.headers()['content-disposition']).toMatch(/^attachment; filename="coming-due-/);
    const lines = (await csv.text()).trim().split('\n');
    expect(lines[0]).toMatch(/^Customer,Fleet number,Machine,/);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.slice(1).every((l) => l.startsWith('Osier Creek Dairy,'))).toBe(true);
    await screenshot(page, 'dealer-board-filtered');
  });

  it('booking — proposes a date for a selected service; Bookings shows it waiting for the farm', async () => {
    // a customer whose link is `service`: proposing a date is service work
    await boardOf(page, 'Larkspur Flats Farm');
    const table = await boardTable(page);
    const first = table.getByRole('checkbox').first();
    const label = (await first.getAttribute('aria-label'))!;
    const fleetNumber = label.replace(/^Select /, '').split(' ')[0];
    await first.check();
    await page.getByRole('button', { name: 'Propose booking' }).click();
    const dialog = page.getByRole('dialog', { name: 'Propose a booking to Larkspur Flats Farm' });
    await dialog.waitFor();
    const date = dialog.getByLabel('Proposed date');
    const min = (await date.getAttribute('min'))!;
    const proposed = format(addDays(parseISO(min), 9), 'yyyy-MM-dd');
    await date.fill(proposed);
    await dialog
      .getByLabel('Note to the farm')
      .fill('Browser test: we can take it in that morning.');
    await dialog.getByRole('button', { name: 'Propose booking' }).click();
    await dialog.getByText(/^Proposed for /).waitFor();
    await screenshot(page, 'dealer-booking-proposed');
    await dialog.getByRole('button', { name: 'Done' }).click();

    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Bookings' })
      .click();
    await page.getByRole('heading', { name: 'Bookings', level: 1 }).waitFor();
    const waiting = page.getByRole('region', { name: 'Waiting for the farm' });
    const card = waiting.getByRole('listitem').filter({ hasText: 'Browser test: we can take it' });
    await card.waitFor();
    expect(await card.innerText()).toContain(fleetNumber);
    expect(await card.innerText()).toContain('Awaiting the farm');
    expect(await card.innerText()).toContain('Larkspur Flats Farm');
  });

  it('board — works on a phone: cards with the customer, and the reminder dialog opens prefilled', async () => {
    const phone = await browser.newPage(PHONE_VIEWPORT);
    await phone.goto('/');
    const me = await (await phone.request.get('/api/v1/me')).json();
    const dealerId = me.data.memberships[0].organization.id as string;
    await phone.goto(`/o/${dealerId}/board`);
    const cards = phone.getByRole('list', { name: 'Services coming due across customers' });
    await cards.waitFor();
    await cards.getByRole('checkbox').first().check();
    await phone.getByRole('button', { name: 'Send reminder' }).click();
    const dialog = phone.getByRole('dialog', { name: /^Reminder to / });
    await dialog.waitFor();
    await dialog.getByLabel('Subject').waitFor();
    expect(await dialog.getByLabel('Subject').inputValue()).toMatch(/^Service coming due: /);
    expect(await dialog.getByLabel('Message').inputValue()).toContain('coming due');
    await screenshot(phone, 'dealer-reminder-phone');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await phone.close();
  });
});
