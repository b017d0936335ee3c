import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { sequelize } from '../../server/db';
import { Membership, Organization, ScheduleTemplate, User } from '../../server/models';
import { hashPassword } from '../../server/services/accounts';
import { buildTemplates } from '../../server/seeders/templates';

// Onboarding a fleet (issue 18) and "history unknown" (issue 10), in the browser: a manager on a
// farm with no machines yet imports a spreadsheet, fixes the bad row it is told about, and answers
// the first of the tasks whose last service nobody knew.
const DESKTOP = { width: 1366, height: 900 };
const EMAIL = `nell.${Date.now()}@fenwick-hollow.example`;
const PASSWORD = 'fenwick-hollow-e2e';

/** A new metric farm (invented) with its manager and the schedule templates a farm starts from. */
async function newEmptyFarm() {
  const org = await Organization.create({
    name: 'Fenwick Hollow Farm',
    kind: 'farm',
    timeZone: 'Europe/Dublin',
    units: 'metric',
  });
  const user = await User.create({
    email: EMAIL,
    name: 'Nell Ashdown',
    passwordHash: await hashPassword(PASSWORD),
  });
  await Membership.create({ organizationId: org.id, userId: user.id, role: 'manager' });
  await ScheduleTemplate.bulkCreate(
    buildTemplates('metric').map((t) => ({ ...t, organizationId: org.id })),
  );
  return org;
}

const daysAgo = (n: number) => {
  const d = new Date(Date.now() - n * 86_400_000);
  return `${String(d.getUTCDate()).padStart(2, '0')}/${String(d.getUTCMonth() + 1).padStart(2, '0')}/${d.getUTCFullYear()}`;
};

/** The spreadsheet: semicolons and decimal commas, as a metric farm's spreadsheet saves it. */
const fleetFile = (loaderCategory: string, schedule: string) =>
  Buffer.from(
    [
      'fleet number;name;category;make;model;year;meter unit;meter reading;reading date;schedule',
      `FH-01;Brindle row-crop tractor;tractor;Brindle;BX 210;2016;h;4210,5;${daysAgo(3)};${schedule}`,
      `FH-02;Corvid yard loader;${loaderCategory};Corvid;CL 95;2019;h;1875;${daysAgo(3)};`,
    ].join('\r\n'),
  );

describe('fleet import — a manager brings a new farm’s fleet in', () => {
  let browser: TestBrowser;
  let page: Page;
  let templateName: string;
  beforeAll(async () => {
    const org = await newEmptyFarm();
    const template = await ScheduleTemplate.findOne({
      where: { organizationId: org.id, category: 'tractor' },
    });
    templateName = template!.name;
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, EMAIL, PASSWORD);
  });
  afterAll(async () => {
    await browser?.close();
    await sequelize.close();
  });

  it('dashboard — the empty farm shows its first steps, none ticked, each with a link', async () => {
    const steps = page.getByRole('list', { name: 'First steps' });
    await steps.waitFor();
    expect(await steps.getByRole('listitem').count()).toBe(6);
    expect(await steps.innerText()).toMatch(/Add or import your machines/);
    await screenshot(page, 'first-run-checklist');
    await steps.getByRole('link', { name: 'Import fleet' }).click();
    await page.getByRole('heading', { name: 'Import fleet' }).waitFor();
  });

  it('import — a bad row is shown by line; fixed, the file imports and the machines are on the fleet', async () => {
    const input = page.getByLabel('Fleet file (CSV)');
    const file = (category: string) => ({
      name: 'fleet.csv',
      mimeType: 'text/csv',
      buffer: fleetFile(category, templateName),
    });
    await input.setInputFiles(file('yard loader'));
    await page.getByRole('button', { name: 'Check file' }).click();
    const alert = page.getByRole('alert').filter({ hasText: /row has errors/ });
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/Line 3, category: "yard loader" is not a category/);
    expect(await page.getByRole('button', { name: /^Import \d+ machines?$/ }).isDisabled()).toBe(
      true,
    );
    await screenshot(page, 'fleet-import-error');

    await input.setInputFiles(file('loader'));
    await page.getByRole('button', { name: 'Check file' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: /2 rows checked: 2 new/ })
      .waitFor();
    await page.getByRole('button', { name: 'Import 2 machines' }).click();
    const done = page.getByRole('status').filter({ hasText: 'The fleet is imported' });
    await done.waitFor();
    expect(await done.innerText()).toMatch(/2 machines added/);
    expect(await done.innerText()).toMatch(/tasks have no known last service/);
    await done.getByRole('link', { name: 'Open the fleet' }).click();
    await page.getByRole('heading', { name: 'Fleet', exact: true }).waitFor();
    await page.getByRole('link', { name: /FH-02/ }).first().waitFor();
  });

  it('machine page — the imported tractor’s tasks are "history unknown", not OK; one is answered with its last service', async () => {
    await page.getByRole('link', { name: /FH-01/ }).first().click();
    const tasks = page.getByRole('list', { name: 'Service tasks' });
    await tasks.waitFor();
    const unknownBefore = await tasks.getByText('History unknown — set last done').count();
    expect(unknownBefore).toBeGreaterThan(1);
    expect(await tasks.getByText('OK', { exact: true }).count()).toBe(0);
    const oil = tasks.getByRole('listitem').filter({ hasText: 'Engine oil and filter' });
    await oil.getByRole('button', { name: 'Set last done for Engine oil and filter' }).click();
    const form = page.getByRole('form', { name: 'Set last done for Engine oil and filter' });
    await form.getByLabel('Meter when last done').fill('3990');
    await form.getByRole('button', { name: 'Save last done' }).click();
    await form.waitFor({ state: 'detached' });
    await oil.getByText(/^Due [\d,.]+ h/).waitFor();
    expect(await oil.getByText('History unknown — set last done').count()).toBe(0);
    expect(await tasks.getByText('History unknown — set last done').count()).toBe(
      unknownBefore - 1,
    );
    await screenshot(page, 'history-unknown-answered');
  });
});
