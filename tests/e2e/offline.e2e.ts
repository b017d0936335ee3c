import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  collectPageErrors,
  launchBrowser,
  PHONE_VIEWPORT,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { larkspurFarm, OFFLINE_FLEET } from './support/demo-fleet';
import { queuedEntries } from './support/outbox';
import { addOwnMachine } from './support/own-machine';
import { apiGet, type Member } from './support/role-flows-api';

// The installed app without a connection (issue 14), with its service worker on. The network
// goes off through Playwright's context.setOffline, which sends the DevTools protocol's
// Network.emulateNetworkConditions (offline: true) to the page and to the service worker's own
// target (a CDP session on the page alone would leave the worker online); the first check below
// shows the worker's fetches fail. Lena opens the app cold from the worker, walks round OF-01 with
// a photo and logs OF-02's hours offline, reloads, reconnects, and each arrives once; a reading
// the server refuses is shown with its reason until she discards it; signing out empties the
// cached answers.
const PASSWORD = 'hourstone-demo';
const [WALKED, LOGGED] = OFFLINE_FLEET;
/** A 1 × 1 PNG: enough for the server to check the type by content and make a thumbnail. */
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

/** The service worker of the build under test (scripts/test.mjs builds into CLIENT_DIST). */
const SW_FILE = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '..',
  '..',
  process.env.CLIENT_DIST ?? 'dist',
  'sw.js',
);

interface Checklist {
  items: { id: string; label: string }[];
}

/** Entries in the cache of API answers (vite.config.ts: hourstone-api). */
const cachedAnswers = (page: Page) =>
  page.evaluate(async () =>
    (await caches.keys()).includes('hourstone-api')
      ? (await (await caches.open('hourstone-api')).keys()).length
      : 0,
  );

/** The cached answers as [path, body] (the signed-out probe may be cached again right away). */
const cachedBodies = (page: Page) =>
  page.evaluate(async () => {
    if (!(await caches.keys()).includes('hourstone-api')) return [];
    const cache = await caches.open('hourstone-api');
    return Promise.all(
      (await cache.keys()).map(async (request) => [
        new URL(request.url).pathname,
        await (await cache.match(request))!.text(),
      ]),
    );
  });

/** Whether a request the worker never saw gets an answer: it cannot, offline. */
const uncachedFetch = (page: Page) =>
  page.evaluate(() =>
    fetch(`/api/v1/health?offline-check=${Date.now()}`).then(
      () => 'answered',
      () => 'failed',
    ),
  );

describe('offline — the installed app in the yard (browser, service worker on)', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let walked: string;
  let logged: string;

  beforeAll(async () => {
    browser = await launchBrowser({ serviceWorkers: 'allow' });
    page = await browser.newPage(PHONE_VIEWPORT);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    ({ id: org } = await larkspurFarm(page));
    const members = (await apiGet(page, `/organizations/${org}/members`)).data as Member[];
    const lena = members.find((m) => m.user.email === 'lena@larkspur.example')!.user.id;
    const tractor = (fleetNumber: string) => ({
      fleetNumber,
      name: `Corvid yard tractor ${fleetNumber}`,
      category: 'tractor',
      meterUnit: 'h',
      operatorIds: [lena],
    });
    walked = await addOwnMachine(page, org, tractor(WALKED), [
      { agoMs: 20 * 3_600_000, value: 1200 },
    ]);
    logged = await addOwnMachine(page, org, tractor(LOGGED), [
      { agoMs: 20 * 3_600_000, value: 500 },
    ]);
  });
  afterAll(async () => {
    await browser?.context.setOffline(false);
    await browser?.close();
  });

  it('a signed-out visit — the sign-in page logs no console error (the session probe answers 200)', async () => {
    const fresh = await browser.newPage(PHONE_VIEWPORT);
    await fresh.context().clearCookies();
    const errors = collectPageErrors(fresh);
    await fresh.goto('/sign-in');
    await fresh.getByLabel('Email', { exact: true }).waitFor();
    await fresh.waitForLoadState('networkidle');
    expect(errors).toEqual([]);
    await fresh.close();
  });

  it('offline — opened cold from the service worker; a walkaround with a photo and a Log hours reading are kept, survive a reload and arrive once', async () => {
    await signIn(page, 'lena@larkspur.example', PASSWORD);
    const checklist = (await apiGet(page, `/organizations/${org}/machines/${walked}/checklist`))
      .data as Checklist;
    // one signed-in visit: the worker installs, then controls the reloaded page and keeps its reads
    await page.goto(`/o/${org}/walkaround/${walked}`);
    await page.evaluate(async () => void (await navigator.serviceWorker.ready));
    await page.reload();
    expect(await page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
    await page.getByRole('heading', { name: `Walkaround · ${WALKED}` }).waitFor();
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Log hours' })
      .click();
    await page.getByLabel(`${LOGGED} reading`, { exact: true }).waitFor();
    expect(await cachedAnswers(page)).toBeGreaterThan(0);

    await browser.context.setOffline(true);
    expect(await uncachedFetch(page)).toBe('failed');

    // cold: a new tab with no connection at all
    await page.close();
    page = await browser.newPage(PHONE_VIEWPORT);
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/walkaround/${walked}`);
    await page.getByRole('heading', { name: `Walkaround · ${WALKED}` }).waitFor();
    await page.getByRole('status').filter({ hasText: 'You’re offline.' }).waitFor();
    await page.getByLabel('Hour meter', { exact: true }).fill('1204');
    for (const item of checklist.items)
      await page
        .getByRole('radiogroup', { name: item.label, exact: true })
        .getByRole('radio', { name: 'OK', exact: true })
        .check();
    const photographed = checklist.items[0];
    await page
      .getByLabel(`Photo for ${photographed.label}`, { exact: true })
      .setInputFiles({ name: 'tyre.png', mimeType: 'image/png', buffer: PNG });
    await page.getByRole('button', { name: 'Send walkaround' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: 'Saved on this phone — it will be sent when the connection returns' })
      .waitFor();
    await screenshot(page, 'offline-walkaround-saved');

    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Log hours' })
      .click();
    await page.getByLabel(`${LOGGED} reading`, { exact: true }).fill('504');
    await page.getByRole('button', { name: 'Save readings' }).click();
    await page.getByText('No connection: 1 reading saved on this phone.').waitFor();
    await page.getByRole('status').filter({ hasText: '2 items wait to be sent.' }).waitFor();
    await screenshot(page, 'offline-log-hours-saved');

    // a reload, still offline: the app opens again and the queue is still there, photo and all
    await page.reload();
    await page.getByLabel(`${LOGGED} reading`, { exact: true }).waitFor();
    const queued = await queuedEntries(page);
    expect(queued.map((e) => [e.kind, e.label, e.state])).toEqual([
      ['walkaround', `${WALKED} walkaround`, 'waiting'],
      ['readings', `${LOGGED} reading`, 'waiting'],
    ]);
    expect(queued[0].photos).toEqual([{ key: photographed.id, size: PNG.length }]);
    const clientId = queued[0].id;
    expect(errors.filter((e) => !/net::ERR_INTERNET_DISCONNECTED|Failed to fetch/.test(e))).toEqual(
      [],
    );

    await browser.context.setOffline(false);
    await expect.poll(async () => (await queuedEntries(page)).length, { timeout: 30_000 }).toBe(0);
    // started again, and told once more that the connection is back: nothing left to send
    await page.reload();
    await page.evaluate(() => window.dispatchEvent(new Event('online')));
    await page.getByLabel(`${LOGGED} reading`, { exact: true }).waitFor();

    const walks = await apiGet(
      page,
      `/organizations/${org}/walkarounds?machineId=${walked}&pageSize=100`,
    );
    expect(walks.meta.total).toBe(1);
    expect(walks.data[0].clientId).toBe(clientId);
    const answer = walks.data[0].items.find(
      (i: { itemId: string }) => i.itemId === photographed.id,
    );
    expect(answer.photoId).not.toBeNull();
    const readings = (
      await apiGet(page, `/organizations/${org}/machines/${logged}/readings?limit=50`)
    ).data as { value: number }[];
    expect(readings.map((r) => r.value).sort((a, b) => a - b)).toEqual([500, 504]);
  }, 120_000);

  it('a refused offline send — shown with the server’s reason and kept until discarded, after a confirmation', async () => {
    await browser.context.setOffline(true);
    await page.getByLabel(`${LOGGED} reading`, { exact: true }).fill('300');
    await page.getByRole('button', { name: 'Save readings' }).click();
    await page.getByText('No connection: 1 reading saved on this phone.').waitFor();
    await browser.context.setOffline(false);

    const refusal = page.getByText(/^Not accepted: /);
    await refusal.waitFor({ timeout: 30_000 });
    expect(await refusal.innerText()).toContain(`${LOGGED}:`);
    const [entry] = await queuedEntries(page);
    expect([entry.state, entry.error?.includes(`${LOGGED}:`)]).toEqual(['refused', true]);
    await screenshot(page, 'offline-refused');
    // kept across a reload, and nothing was written
    await page.reload();
    await refusal.waitFor();
    const readings = (
      await apiGet(page, `/organizations/${org}/machines/${logged}/readings?limit=50`)
    ).data as { value: number }[];
    expect(readings.map((r) => r.value)).not.toContain(300);

    await page.getByRole('button', { name: 'Discard', exact: true }).click();
    const dialog = page.getByRole('dialog', { name: `Discard the ${LOGGED} reading?` });
    await dialog.getByRole('button', { name: 'Discard' }).click();
    await expect.poll(async () => (await queuedEntries(page)).length).toBe(0);
    expect(await refusal.count()).toBe(0);
  }, 60_000);

  it('sign-out — the cached answers are emptied; offline, the app then opens on sign-in with no farm data', async () => {
    expect(await cachedAnswers(page)).toBeGreaterThan(0);
    await page.goto(`/o/${org}/account`);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL((url) => url.pathname.startsWith('/sign-in'));
    await page.getByLabel('Email', { exact: true }).waitFor();
    // nothing of lena's is left: only what the signed-out sign-in page itself asked for (the
    // probe's "nobody is signed in", whether sign-up is open), nothing of a farm or a person
    await expect
      .poll(async () =>
        (await cachedBodies(page)).filter(
          ([url, body]) =>
            url.includes('/organizations') || body.includes(WALKED) || body.includes('lena'),
        ),
      )
      .toEqual([]);
    const probe = (await cachedBodies(page)).find(([url]) => url === '/api/v1/session');
    if (probe) expect(JSON.parse(probe[1])).toEqual({ data: { signedIn: false } });

    await browser.context.setOffline(true);
    await page.goto(`/o/${org}/log-hours`);
    // no session to be found offline: the app cannot show anyone's farm
    expect(await page.getByLabel(`${LOGGED} reading`, { exact: true }).count()).toBe(0);
    expect(await page.locator('body').innerText()).not.toContain(WALKED);
    await browser.context.setOffline(false);
  });

  it('a new version deployed — the open app says so, and Reload brings the new one in', async () => {
    await page.goto('/sign-in');
    await page.evaluate(async () => void (await navigator.serviceWorker.ready));
    const original = await readFile(SW_FILE, 'utf8');
    try {
      // a deploy: the worker script's bytes change (browsers compare them byte for byte)
      await writeFile(SW_FILE, `${original}\n// the next build\n`);
      await page.evaluate(async () => {
        await (await navigator.serviceWorker.getRegistration())?.update();
      });
      const prompt = page
        .getByRole('alert')
        .filter({ hasText: 'A new version of Hourstone is ready.' });
      await prompt.waitFor({ timeout: 30_000 });
      await screenshot(page, 'offline-update-prompt');
      await Promise.all([
        page.waitForEvent('load'),
        prompt.getByRole('button', { name: 'Reload' }).click(),
      ]);
      await page.getByLabel('Email', { exact: true }).waitFor();
      expect(
        await page.evaluate(async () =>
          Boolean((await navigator.serviceWorker.getRegistration())?.waiting),
        ),
      ).toBe(false);
      expect(await prompt.count()).toBe(0);
    } finally {
      await writeFile(SW_FILE, original);
    }
  }, 60_000);
});
