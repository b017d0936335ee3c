// Readings from the machine, in the browser (issue 13): the manager makes an API key in Settings
// (the key shown once, then only its prefix), a telematics snapshot is posted with that key
// through the page's request context, and the machine page shows the reading with where it came
// from (Telematics and the key's name). The machine is the test's own (TELEMATICS_FLEET).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { larkspurFarm, TELEMATICS_FLEET } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';

const DAY = 86_400_000;
const SERIAL = 'TM-E2E-0001';

describe('telematics — a key made in Settings brings a reading the machine page shows', () => {
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('manager makes a key (shown once), a snapshot posted with it lands on the machine page as Telematics · key name', async () => {
    const page = await browser.newPage();
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    const org = await larkspurFarm(page);
    const machineId = await addOwnMachine(
      page,
      org.id,
      {
        fleetNumber: TELEMATICS_FLEET,
        name: 'Feed test tractor',
        category: 'tractor',
        serialNumber: SERIAL,
      },
      [{ agoMs: 3 * DAY, value: 400 }],
    );

    await page.goto(`${baseUrl}/o/${org.id}/settings`);
    await page.getByRole('heading', { name: 'API keys for machine data' }).waitFor();
    await page.getByLabel('Key name').fill('E2E yard feed');
    await page.getByRole('button', { name: 'Make API key' }).click();
    const shown = page.getByLabel('Your new API key');
    await shown.waitFor();
    const secret = await shown.inputValue();
    expect(secret).toMatch(/^hs_[a-z0-9]{8}_[A-Za-z0-9_-]{43}$/);
    await page.getByText('it is shown this once').waitFor();
    const prefix = secret.slice(3, 11);
    const listed = page.getByRole('list', { name: 'API keys' }).getByRole('listitem').filter({
      hasText: 'E2E yard feed',
    });
    await listed.getByText(`hs_${prefix}_…`).waitFor();
    await expect(listed.getByText('readings:write').count()).resolves.toBe(1);
    await screenshot(page, 'telematics-key-made');
    await page.getByRole('button', { name: 'I have copied it' }).click();
    await shown.waitFor({ state: 'detached' });
    // once put away, the key is nowhere on the page
    expect(await page.content()).not.toContain(secret.slice(12));

    const takenAt = new Date(Date.now() - 60 * 60_000).toISOString();
    const posted = await page.request.post('/api/v1/telematics/iso15143-3', {
      headers: { Authorization: `Bearer ${secret}` },
      data: {
        Fleet: {
          version: '1',
          Equipment: [
            {
              EquipmentHeader: { OEMName: 'Brindle', Model: 'Test', SerialNumber: SERIAL },
              CumulativeOperatingHours: { datetime: takenAt, Hour: 412.5 },
            },
          ],
        },
      },
    });
    expect(posted.status()).toBe(200);
    const answer = await posted.json();
    expect(answer.data.items[0]).toMatchObject({ status: 'recorded', machineId });

    await page.goto(`${baseUrl}/o/${org.id}/machines/${machineId}`);
    const history = page.getByRole('list', { name: 'Reading history' });
    const row = history.getByRole('listitem').filter({ hasText: /412\.5 h/ });
    await row.waitFor();
    await row.getByText('Telematics · E2E yard feed').waitFor();
    // the typed reading says it was entered by hand
    await history.getByRole('listitem').filter({ hasText: /400 h/ }).getByText('Entered').waitFor();
    await screenshot(page, 'telematics-machine-page');
  });
});
