import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  PHONE_VIEWPORT,
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { RESTRICTED_USE_FLEET, larkspurFarm } from './support/demo-fleet';
import { apiGet, type Member } from './support/role-flows-api';

// Restricted use and the walkaround's phases in the browser (issue 11): the manager restricts a
// machine on its page ("field only, no road"), and its operator reads the reason on the picker
// and again at the top of the walkaround, which is walked round before start and then checked
// from the seat. RU-01 is this file's own machine (support/demo-fleet.ts).

const PASSWORD = 'hourstone-demo';
const DESKTOP = { width: 1280, height: 800 } as const;
const FLEET = RESTRICTED_USE_FLEET;
const REASON = 'Field only — no road: left rear flasher out';
const REASON_LABEL = 'What it may and may not be used for, and why';

describe('restricted use — set by the manager, read by the operator before the walkaround (browser)', () => {
  let browser: TestBrowser;
  let orgId: string;
  let machineId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    orgId = (await larkspurFarm(page)).id;
    const members = (await apiGet(page, `/organizations/${orgId}/members`)).data as Member[];
    const lena = members.find((m) => m.user.email === 'lena@larkspur.example')!.user.id;
    const created = await page.request.post(`/api/v1/organizations/${orgId}/machines`, {
      data: {
        fleetNumber: FLEET,
        name: 'Harl road tractor',
        category: 'tractor',
        meterUnit: 'h',
        operatorIds: [lena],
      },
    });
    expect(created.status()).toBe(201);
    machineId = (await created.json()).data.id;
    await page.close();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('manager — restricts RU-01 on its page; a missing reason is named beside the field; the fleet list marks it in words', async () => {
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    // from here on (the sign-in page's own session check answers 401 before signing in)
    const errors = collectPageErrors(page);
    await page.goto(`/o/${orgId}/machines/${machineId}`);
    await page.getByRole('button', { name: 'Restrict use…' }).click();
    const form = page.getByRole('form', { name: `Restrict the use of ${FLEET}` });
    await form.getByRole('button', { name: `Restrict ${FLEET}` }).click();
    // refused in the form, beside the field, before anything is sent
    const field = form.getByLabel(REASON_LABEL);
    expect(await field.getAttribute('aria-invalid')).toBe('true');
    await form.getByText('Say what the machine may and may not be used for, and why').waitFor();
    await field.fill(REASON);
    await form.getByRole('button', { name: `Restrict ${FLEET}` }).click();
    const panel = page.getByRole('region', { name: `${FLEET} is restricted` });
    await panel.getByText(REASON).waitFor();
    expect(await panel.innerText()).toMatch(/may be walked round and used within this limit/);
    await panel.getByRole('button', { name: 'Lift the restriction…' }).waitFor();
    await screenshot(page, 'restricted-use-machine-page');

    await page.goto(`/o/${orgId}/machines?q=${FLEET}`);
    const row = page.getByRole('row').filter({ hasText: FLEET });
    await row.getByText('Restricted use').waitFor();
    expect(await row.innerText()).toContain(REASON);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('operator (phone) — the picker and the walkaround say the reason in full; the walkaround is in two phases', async () => {
    const page = await browser.newPage(PHONE_VIEWPORT);
    await signIn(page, 'lena@larkspur.example', PASSWORD);
    const errors = collectPageErrors(page);
    await page.goto(`/o/${orgId}/walkaround`);
    // still a link: a restricted machine may be walked round and used, within the limit
    const choice = page.getByRole('link', { name: new RegExp(`^${FLEET}`) });
    await choice.getByText('Restricted use').waitFor();
    const reasonOnCard = choice.getByText(REASON);
    expect(await reasonOnCard.isVisible(), 'the reason is on the card, not behind a hover').toBe(
      true,
    );
    await choice.click();
    await page.getByRole('heading', { name: `Walkaround · ${FLEET}` }).waitFor();

    const notice = page.getByRole('status').filter({ hasText: `Restricted use — ${FLEET}` });
    await notice.getByText(REASON).waitFor();
    const before = page.getByRole('region', { name: /^Before start — engine off, key out/ });
    const seat = page.getByRole('region', { name: /^In the seat, engine running/ });
    expect(await before.count()).toBeGreaterThan(0);
    expect(await seat.count()).toBeGreaterThan(0);
    // the reason comes first, above the meter and the checklist
    const noticeTop = (await notice.boundingBox())!.y;
    const firstSectionTop = (await before.first().boundingBox())!.y;
    expect(noticeTop).toBeLessThan(firstSectionTop);
    // the walk round comes before the seat, and the seat holds the brakes, pedal latch and steering
    expect((await seat.first().boundingBox())!.y).toBeGreaterThan(
      (await before.last().boundingBox())!.y,
    );
    await before
      .first()
      .getByText(/engine off, the key in your pocket/)
      .waitFor();
    for (const label of ['Service brakes', 'Brake pedal latch', 'Steering free play and response'])
      expect(await seat.getByRole('radiogroup', { name: label, exact: true }).count(), label).toBe(
        1,
      );
    expect(
      await before.getByRole('radiogroup', { name: 'Engine oil level', exact: true }).count(),
    ).toBe(1);
    await screenshot(page, 'restricted-use-walkaround-start');
    expect(errors).toEqual([]);
    await page.close();
  });
});
