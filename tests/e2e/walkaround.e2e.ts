import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  PHONE_VIEWPORT,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { WRITTEN_OR_READ_BY_OTHERS } from './support/demo-fleet';
import { queuedEntries } from './support/outbox';

// The operator's daily walkaround on a phone (issue 4): every item answered, a photo, a critical
// fail that tags the machine out; and the offline queue that must not send a walkaround twice.
// The browser tests share one seeded database and their files run in any order: the machines used
// here are kept clear of the ones the other files use (support/demo-fleet.ts).

const PASSWORD = 'hourstone-demo';
/** A 1 × 1 PNG: enough for the server to check the type by content and make a thumbnail. */
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

interface Machine {
  id: string;
  fleetNumber: string;
  status: string;
  meterUnit: string;
}
interface ChecklistItem {
  id: string;
  label: string;
  critical: boolean;
  caution: string;
}
interface Checklist {
  machine: Machine & { lastReading: { value: number; takenAt: string } | null };
  items: ChecklistItem[];
}
interface WalkaroundRow {
  clientId: string;
  taggedOut: boolean;
  items: { itemId: string; result: string; photoId: string | null }[];
}

const escapeRegex = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
/** Matches a name that starts with `text` as a whole word. */
const startsWith = (text: string) => new RegExp(`^${escapeRegex(text)}\\b`);

const api = (page: Page, path: string) =>
  page.request.get(`/api/v1${path}`).then(async (response) => {
    expect(response.status(), path).toBe(200);
    return response.json();
  });

/** A meter value that keeps inside the reading rules (at most 20 h per elapsed day here). */
function nextMeter(checklist: Checklist): string {
  const last = checklist.machine.lastReading;
  if (!last) return '100';
  const days = Math.max(0, (Date.now() - new Date(last.takenAt).getTime()) / 86_400_000);
  const add = checklist.machine.meterUnit === 'h' ? Math.min(2, 20 * days) : 15;
  return String(Math.round((last.value + add) * 10) / 10);
}

async function answerAll(page: Page, items: ChecklistItem[], fail?: ChecklistItem) {
  for (const item of items) {
    await page
      .getByRole('radiogroup', { name: item.label, exact: true })
      .getByRole('radio', { name: item === fail ? 'Fail' : 'OK', exact: true })
      .check();
  }
}

describe('daily walkaround on a phone (browser)', () => {
  let browser: TestBrowser;
  let page: Page;
  let orgId: string;
  /** tagged out by the first test */
  let tagged: { machine: Machine; checklist: Checklist; critical: ChecklistItem };
  /** walked round offline by the second */
  let offline: { machine: Machine; checklist: Checklist };

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(PHONE_VIEWPORT);
    await signIn(page, 'lena@larkspur.example', PASSWORD);
    const me = await api(page, '/me');
    orgId = me.data.memberships.find(
      (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
    ).organization.id;

    // machines lena may use, in service, that no other browser test writes to
    const mine = (await api(page, `/organizations/${orgId}/machines?sort=fleetNumber&pageSize=200`))
      .data as Machine[];
    const free = mine.filter(
      (m) => m.status === 'in_service' && !WRITTEN_OR_READ_BY_OTHERS.has(m.fleetNumber),
    );
    const withChecklists = await Promise.all(
      free.map(async (machine) => ({
        machine,
        checklist: (await api(page, `/organizations/${orgId}/machines/${machine.id}/checklist`))
          .data as Checklist,
      })),
    );
    const first = withChecklists.find((c) => c.checklist.items.some((i) => i.critical));
    expect(first, 'a machine of lena with a critical checklist item').toBeDefined();
    tagged = { ...first!, critical: first!.checklist.items.find((i) => i.critical)! };
    const second = withChecklists.find((c) => c.machine.id !== tagged.machine.id);
    expect(second, 'a second machine of lena for the offline walkaround').toBeDefined();
    offline = second!;
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('360 × 740 — lena answers every item, adds a photo and fails a critical item; the machine is tagged out and cannot be picked again', async () => {
    const { machine, checklist, critical } = tagged;
    const fleet = machine.fleetNumber;

    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Walkaround' })
      .click();
    await page.getByRole('heading', { name: 'Daily walkaround' }).waitFor();
    await page
      .getByRole('list', { name: 'Assigned to you' })
      .getByRole('link', { name: startsWith(fleet) })
      .click();
    await page.getByRole('heading', { name: `Walkaround · ${fleet}` }).waitFor();

    const meterLabel = machine.meterUnit === 'h' ? 'Hour meter' : `Meter (${machine.meterUnit})`;
    await page.getByLabel(meterLabel, { exact: true }).fill(nextMeter(checklist));
    // hazard items carry their caution, deferring to the manual; critical items say so
    const cautions = checklist.items.filter((i) => i.caution).length;
    expect(cautions).toBeGreaterThan(0);
    expect(await page.getByRole('complementary', { name: 'Caution' }).count()).toBe(cautions);
    expect(await page.getByRole('complementary', { name: 'Caution' }).first().innerText()).toMatch(
      /operator's manual/,
    );
    expect(await page.locator('main').getByText('Critical', { exact: true }).count()).toBe(
      checklist.items.filter((i) => i.critical).length,
    );

    await answerAll(page, checklist.items, critical);
    await page
      .getByLabel(`Note for ${critical.label}`, { exact: true })
      .fill('Found damaged on the morning check');
    await page
      .getByLabel(`Photo for ${critical.label}`, { exact: true })
      .setInputFiles({ name: 'damage.png', mimeType: 'image/png', buffer: PNG });
    await page.getByRole('img', { name: `Photo for ${critical.label}` }).waitFor();
    expect(
      await page
        .getByText(`${checklist.items.length} of ${checklist.items.length} answered`)
        .count(),
    ).toBe(1);

    // big targets, nothing wider than the phone
    const fail = page
      .getByRole('radiogroup', { name: critical.label, exact: true })
      .getByRole('radio', { name: 'Fail', exact: true });
    expect((await fail.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      PHONE_VIEWPORT.width,
    );
    await fail.scrollIntoViewIfNeeded();
    await screenshot(page, 'walkaround-phone-form');

    await page.getByRole('button', { name: 'Send walkaround' }).click();
    const alert = page.getByRole('alert').filter({ hasText: `Do not use ${fleet}.` });
    await alert.waitFor();
    expect((await alert.textContent())!.replace(/\s+/g, ' ')).toContain(
      `Do not use ${fleet}. It is tagged out until a technician or manager clears it.`,
    );
    const raised = page.getByRole('region', { name: 'Reported to the shop' });
    expect(await raised.innerText()).toContain(critical.label);
    expect(await raised.innerText()).toContain('Critical — do not use');
    await screenshot(page, 'walkaround-phone-tagged-out');

    const sent = (await api(page, `/organizations/${orgId}/walkarounds?machineId=${machine.id}`))
      .data as WalkaroundRow[];
    expect(sent[0].taggedOut).toBe(true);
    const answer = sent[0].items.find((i) => i.itemId === critical.id)!;
    expect(answer.result).toBe('fail');
    expect(answer.photoId).not.toBeNull();

    // the picker lists it as tagged out, not as a link
    await page.getByRole('link', { name: 'Walk round another machine' }).click();
    await page.getByRole('heading', { name: 'Daily walkaround' }).waitFor();
    const row = page
      .getByRole('list', { name: 'Assigned to you' })
      .getByRole('listitem')
      .filter({ has: page.getByText(fleet, { exact: true }) });
    await row.waitFor();
    expect(await row.innerText()).toContain('Tagged out — do not use');
    expect(await row.getByRole('link').count()).toBe(0);
    await screenshot(page, 'walkaround-phone-picker-tagged-out');

    // and its walkaround (the QR code's address) says so instead of offering the checklist
    await page.goto(`/o/${orgId}/walkaround/${machine.id}`);
    const refused = page.getByRole('alert').filter({ hasText: `${fleet} is tagged out` });
    await refused.waitFor();
    expect(await refused.innerText()).toMatch(/do not use it until a technician or manager/);
    expect(await page.getByRole('button', { name: 'Send walkaround' }).count()).toBe(0);
    await screenshot(page, 'walkaround-phone-open-tagged-out');
  });

  it('offline — the walkaround is saved on the phone, sent when the connection returns, and recorded once', async () => {
    const { machine, checklist } = offline;
    const before = (await api(page, `/organizations/${orgId}/walkarounds?machineId=${machine.id}`))
      .meta.total as number;

    await page.goto(`/o/${orgId}/walkaround/${machine.id}`);
    await page.getByRole('heading', { name: `Walkaround · ${machine.fleetNumber}` }).waitFor();
    const meterLabel = machine.meterUnit === 'h' ? 'Hour meter' : `Meter (${machine.meterUnit})`;
    await page.getByLabel(meterLabel, { exact: true }).fill(nextMeter(checklist));
    await answerAll(page, checklist.items);

    await browser.context.setOffline(true);
    await page.getByRole('button', { name: 'Send walkaround' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: 'Saved on this phone — it will be sent when the connection returns' })
      .waitFor();
    const queued = await queuedEntries(page);
    expect(queued).toHaveLength(1);
    const { id: clientId, body: input } = queued[0];
    await screenshot(page, 'walkaround-phone-offline-saved');

    await browser.context.setOffline(false);
    await page.getByRole('status').filter({ hasText: 'Walkaround sent' }).waitFor();
    await screenshot(page, 'walkaround-phone-offline-sent');

    // starting the app again, and another `online` event, find nothing left to send
    await page.reload();
    await page.evaluate(() => window.dispatchEvent(new Event('online')));
    await page.getByRole('heading', { name: `Walkaround · ${machine.fleetNumber}` }).waitFor();
    expect(await queuedEntries(page)).toEqual([]);
    // a resend whose first answer was lost is answered as a duplicate, not recorded again
    const resend = await page.request.post(`/api/v1/organizations/${orgId}/walkarounds`, {
      data: input,
    });
    expect(resend.status()).toBe(200);
    expect((await resend.json()).duplicate).toBe(true);

    const after = await api(
      page,
      `/organizations/${orgId}/walkarounds?machineId=${machine.id}&pageSize=100`,
    );
    expect(after.meta.total).toBe(before + 1);
    expect(after.data.filter((w: WalkaroundRow) => w.clientId === clientId)).toHaveLength(1);
  });

  it('defects and label — the shop sees the critical defect and the tag-out; the manager prints the QR label', async () => {
    const { machine, critical } = tagged;
    // a browser of its own: signing the shop in must not sign lena out of the other tests' page
    const shopBrowser = await launchBrowser();
    try {
      const shop = await shopBrowser.newPage({ width: 1280, height: 800 });
      await signIn(shop, 'dev@larkspur.example', PASSWORD);
      await shop.goto(`/o/${orgId}/defects?machineId=${machine.id}`);
      await shop.getByRole('heading', { name: 'Defects', exact: true }).waitFor();
      const defect = shop.getByRole('article', {
        name: new RegExp(`^${escapeRegex(critical.label)}:`),
      });
      await defect.waitFor();
      expect(await defect.innerText()).toContain('Critical — do not use');
      expect(await defect.getByRole('img', { name: /^Photo of / }).count()).toBe(1);
      expect(
        await shop.getByRole('region', { name: 'Tagged out — do not use' }).innerText(),
      ).toContain(machine.fleetNumber);
      await screenshot(shop, 'walkaround-defects-desktop');

      await signIn(shop, 'marta@larkspur.example', PASSWORD);
      await shop.goto(`/o/${orgId}/machines/${machine.id}/label`);
      await shop.getByRole('heading', { name: `QR label · ${machine.fleetNumber}` }).waitFor();
      const label = shop.getByRole('img', { name: /^Walkaround QR code for / });
      await label.waitFor();
      await expect
        .poll(() => label.evaluate((img: HTMLImageElement) => img.naturalWidth))
        .toBeGreaterThan(0);
      expect(await shop.getByRole('button', { name: 'Print' }).count()).toBe(1);
      expect(await shop.getByRole('link', { name: 'Download SVG' }).getAttribute('href')).toContain(
        'label.svg?download=1',
      );
      await screenshot(shop, 'walkaround-label-desktop');
    } finally {
      await shopBrowser.close();
    }
  });
});
