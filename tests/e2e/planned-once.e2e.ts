// Issue 10 "What new users tripped on", in the browser: Bookings is in the farm manager's menu and
// the dashboard says a dealer proposal waits (the demo's S-01 proposal, read only); recording a
// service on a machine with an open plan offers to complete that plan, and completing it takes the
// plan out of the shop week; a dealer's proposal of the planned work warns the farm before it
// accepts; a photo attached as photo.png shows as photo.png. Writes only PL-01,
// a machine it adds itself (support/demo-fleet.ts).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { launchBrowser, signIn, type TestBrowser } from './support/browser';
import { PLANNED_ONCE_FLEET, larkspurFarm } from './support/demo-fleet';

const DESKTOP = { width: 1280, height: 800 };
const DAY = 86_400_000;

const localToday = (timeZone: string) =>
  new Intl.DateTimeFormat('en-CA', { timeZone }).format(new Date());

describe('planned once — the same work is not planned twice, in the browser', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let machineId: string;
  let taskId: string;
  let planId: string;
  let timeZone: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    const farm = await larkspurFarm(page);
    org = farm.id;
    timeZone = farm.timeZone;
    const api = `/api/v1/organizations/${org}`;
    const created = await page.request.post(`${api}/machines`, {
      data: { fleetNumber: PLANNED_ONCE_FLEET, name: 'Brindle yard loader', category: 'loader' },
    });
    expect(created.status()).toBe(201);
    machineId = (await created.json()).data.id;
    for (const [daysAgo, value] of [
      [20, 500],
      [1, 700],
    ]) {
      const takenAt = new Date(Date.now() - daysAgo * DAY).toISOString();
      const res = await page.request.post(`${api}/machines/${machineId}/readings`, {
        data: { value, takenAt },
      });
      expect(res.status()).toBe(201);
    }
    const task = await page.request.post(`${api}/machines/${machineId}/tasks`, {
      data: {
        name: 'Bucket pins grease',
        intervalMeter: 250,
        lastDoneMeter: 480,
        parts: [{ partNumber: 'HS-GR-0001', description: 'Grease cartridge', quantity: 2 }],
      },
    });
    expect(task.status()).toBe(201);
    taskId = (await task.json()).data.id;
    const plan = await page.request.post(`${api}/machines/${machineId}/service-records`, {
      data: { status: 'planned', plannedFor: localToday(farm.timeZone), taskIds: [taskId] },
    });
    expect(plan.status()).toBe(201);
    planId = (await plan.json()).data.id;
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("menu and dashboard — Bookings is in the manager's menu; the dashboard says a proposal waits and links to it", async () => {
    await page.goto(`/o/${org}`);
    await page.getByRole('heading', { name: 'Dashboard', level: 1 }).waitFor();
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Bookings' }).first().waitFor();
    const waiting = page.getByRole('status').filter({ hasText: 'Bookings waiting for an answer' });
    await waiting.waitFor();
    await waiting.getByRole('link', { name: /^Answer the (proposal|\d+ proposals)$/ }).click();
    await page.getByRole('heading', { name: 'Bookings', level: 1 }).waitFor();
    await page
      .getByRole('button', { name: /^Accept (booking|anyway)$/ })
      .first()
      .waitFor();
  });

  it('dealer booking — a proposal covering the planned work says so before the farm accepts it', async () => {
    // the advisor proposes the same task on PL-01 for the plan's day (the dealer has a service link)
    await signIn(page, 'ravi@quillon.example', 'hourstone-demo');
    const me = await (await page.request.get('/api/v1/me')).json();
    const dealer = me.data.memberships.find(
      (m: { organization: { kind: string } }) => m.organization.kind === 'dealer',
    ).organization.id as string;
    const proposed = await page.request.post(`/api/v1/organizations/${dealer}/bookings`, {
      data: {
        customerId: org,
        proposedFor: localToday(timeZone),
        items: [{ machineId, taskIds: [taskId] }],
      },
    });
    expect(proposed.status()).toBe(201);
    const bookingId = (await proposed.json()).data.id as string;

    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    await page.goto(`/o/${org}/bookings`);
    await page.getByRole('heading', { name: 'Bookings', level: 1 }).waitFor();
    const warning = page.getByRole('status').filter({ hasText: 'Overlaps a planned visit' });
    await warning.filter({ hasText: PLANNED_ONCE_FLEET }).waitFor();
    expect(await warning.filter({ hasText: PLANNED_ONCE_FLEET }).innerText()).toContain(
      `${PLANNED_ONCE_FLEET} is planned for`,
    );
    expect(await page.getByRole('button', { name: 'Accept anyway' }).count()).toBeGreaterThan(0);
    // declined, so no proposal of this file is left waiting for the other files
    const declined = await page.request.post(
      `/api/v1/organizations/${org}/bookings/${bookingId}/decline`,
      { data: {} },
    );
    expect(declined.status()).toBe(200);
  });

  it('record service — offers the open plan; completing it takes the plan out of the shop week, and the photo keeps its name', async () => {
    await page.goto(`/o/${org}/shop`);
    await page.getByRole('heading', { name: 'Shop week', level: 1 }).waitFor();
    await page.getByText(PLANNED_ONCE_FLEET).first().waitFor();

    await page.goto(`/o/${org}/machines/${machineId}/services/new?taskIds=${taskId}`);
    await page.getByRole('heading', { name: `Record service · ${PLANNED_ONCE_FLEET}` }).waitFor();
    await page.getByText('This work is planned already').waitFor();
    await page.getByRole('radio', { name: /^Complete the plan of / }).check();
    await page.getByLabel('Meter at service').fill('700');
    await page.getByRole('button', { name: 'Complete service' }).click();
    await page.waitForURL(new RegExp(`/service-records/${planId}$`));

    const file = await sharp({
      create: { width: 40, height: 30, channels: 3, background: '#6b8e23' },
    })
      .png()
      .toBuffer();
    await page
      .getByLabel('Add photo or PDF')
      .setInputFiles({ name: 'photo.png', mimeType: 'image/png', buffer: file });
    await page.getByText('photo.png added.').waitFor();
    await page.getByRole('img', { name: 'Photo photo.png' }).waitFor();
    expect(await page.getByText('photo.webp').count()).toBe(0);

    await page.goto(`/o/${org}/shop`);
    await page.getByRole('heading', { name: 'Shop week', level: 1 }).waitFor();
    const plans = await (await page.request.get(`/api/v1/organizations/${org}/shop-week`)).json();
    const ids = (plans.data.days as { planned: { id: string }[] }[]).flatMap((d) =>
      d.planned.map((p) => p.id),
    );
    expect(ids).not.toContain(planId);
  });
});
