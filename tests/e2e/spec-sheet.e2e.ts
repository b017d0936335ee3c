// Issue 11, the spec sheet in the browser: the manager adds a tractor of her own (SP-01, written by
// no other file), fills its spec sheet on the machine page — an engine oil capacity and a test
// pressure with its conditions — then records a visit where the sheet's test gives the
// measurement its spec, measures 12 psi against 20–60 (the example) and raises a defect
// from the record in one tap.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  PHONE_VIEWPORT,
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { SPEC_SHEET_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';

const DESKTOP = { width: 1280, height: 800 };
const TEST = 'Hydraulic charge pressure';
const TEST_PRESSURE = {
  name: TEST,
  min: 20,
  max: 60,
  unit: 'psi',
  engineRpm: 2100,
  oilTemperature: { value: 50, unit: 'C' },
  conditions: '',
};

describe('spec sheet — fill it, and raise a defect from a measurement outside its spec', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let machineId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    org = (await larkspurFarm(page)).id;
    machineId = await addOwnMachine(
      page,
      org,
      { fleetNumber: SPEC_SHEET_FLEET, name: 'Spec sheet tractor', category: 'tractor' },
      [{ agoMs: 60_000, value: 1200 }],
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the manager fills the sheet; the test pressure shows with its conditions', async () => {
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/machines/${machineId}#spec`);
    const section = page.getByRole('region', { name: 'Spec sheet' });
    await section.getByText('Nothing on the sheet yet.', { exact: false }).waitFor();
    await section.getByRole('button', { name: 'Edit spec sheet' }).click();

    const form = section.getByRole('form', { name: 'Spec sheet' });
    const oil = form.getByRole('group', { name: 'Engine oil', exact: true });
    await oil.getByLabel('Quantity').fill('17.5');
    await oil.getByLabel('Unit').selectOption('L');
    await oil.getByLabel('Fluid specification').fill('SAE 15W-40, API CK-4');
    await form.getByLabel('Engine oil filter').fill('BR-OF-118');
    await form.getByRole('button', { name: 'Add test pressure' }).click();
    const test = form.getByRole('group', { name: 'Test pressure 1' });
    await test.getByLabel('Test name').fill(TEST);
    await test.getByLabel('Minimum').fill('20');
    await test.getByLabel('Maximum').fill('60');
    await test.getByLabel('Unit', { exact: true }).selectOption('psi');
    await test.getByLabel('Engine speed (rpm)').fill('2100');
    await test.getByLabel('Oil temperature').fill('50');
    await test.getByLabel('Temperature unit').selectOption('C');
    await form.getByRole('button', { name: 'Save spec sheet' }).click();

    await section.getByText('Spec sheet saved.', { exact: false }).waitFor();
    await section.getByText('17.5 L — SAE 15W-40, API CK-4').waitFor();
    await section.getByText('BR-OF-118').waitFor();
    const tests = section.getByText('Test pressures', { exact: true }).locator('..');
    expect(await tests.innerText()).toContain('20–60 psi at 2,100 rpm, oil 50 °C');
    await screenshot(page, 'spec-sheet-filled');
    // on a phone the form's rows stack: the test's fields are on screen, none cut off
    const phone = await browser.newPage(PHONE_VIEWPORT);
    await phone.goto(`/o/${org}/machines/${machineId}#spec`);
    await phone.getByRole('button', { name: 'Edit spec sheet' }).click();
    const onPhone = phone.getByRole('group', { name: 'Test pressure 1' });
    await onPhone.getByLabel('Test name').scrollIntoViewIfNeeded();
    const box = await onPhone.getByLabel('Oil temperature').boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(PHONE_VIEWPORT.width);
    await screenshot(phone, 'spec-sheet-form-phone');
    await phone.close();
    expect(errors).toEqual([]);
  }, 60_000);

  it("a measurement of the sheet's test takes its spec; 12 psi against 20–60 raises a defect in one tap", async () => {
    // the sheet's test as the first test saves it, so this test also runs alone (-t)
    const sheet = await page.request.patch(
      `/api/v1/organizations/${org}/machines/${machineId}/spec-sheet`,
      { data: { testPressures: [TEST_PRESSURE] } },
    );
    expect(sheet.status()).toBe(200);
    await page.goto(`/o/${org}/machines/${machineId}/services/new`);
    await page.getByRole('heading', { name: `Record service · ${SPEC_SHEET_FLEET}` }).waitFor();
    await page.getByLabel('Meter at service').fill('1200');
    await page.getByRole('button', { name: `${TEST} (spec sheet)` }).click();
    const m = page.getByRole('group', { name: 'Measurement 1' });
    expect(await m.getByLabel('Measurement name').inputValue()).toBe(TEST);
    expect(await m.getByLabel('Spec min').inputValue()).toBe('20');
    expect(await m.getByLabel('Spec max').inputValue()).toBe('60');
    expect(await m.getByLabel('Unit').inputValue()).toBe('psi');
    await m.getByText('at 2,100 rpm, oil 50 °C', { exact: false }).waitFor();
    await m.getByLabel('Value').fill('12');
    await page.getByRole('button', { name: 'Complete service' }).click();

    // right after saving, the record says the measurement is outside its spec
    await page
      .getByRole('heading', { name: new RegExp(`^Service · ${SPEC_SHEET_FLEET} · `) })
      .waitFor();
    const notice = page.getByRole('list', { name: 'Outside the spec' });
    await notice.getByText(`${TEST}: 12 psi against 20–60 psi`).waitFor();
    await notice.getByRole('button', { name: `Raise a defect: ${TEST}` }).click();
    await notice.getByText('Defect raised.', { exact: false }).waitFor();
    await screenshot(page, 'spec-sheet-defect-raised');

    const defects = await page.request.get(
      `/api/v1/organizations/${org}/machines/${machineId}/defects?status=active`,
    );
    const titles = (await defects.json()).data.map((d: { title: string }) => d.title);
    expect(titles).toEqual([`Out of spec: ${TEST} 12 psi (spec 20–60 psi)`]);
    // opened again later, the record knows the defect is open and offers no second one
    await page.reload();
    await notice.getByText('A defect for this is open.', { exact: false }).waitFor();
    expect(await notice.getByRole('button', { name: /Raise a defect/ }).count()).toBe(0);
  }, 60_000);
});
