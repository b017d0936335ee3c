import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { ROLE_FLOWS_FLEET } from './support/demo-fleet';
import { apiGet, farmId, type Member } from './support/role-flows-api';

// What new users tripped on (issue 10), one role at a time, on the screens they use. The machines
// written here are this file's own (support/demo-fleet.ts): RF-01 and the tagged-out RF-03 are
// lena's, RF-02 is sam's. Everything else is read as the demo loaded it.

const PASSWORD = 'hourstone-demo';
/** The phone the issue names. */
const PHONE = { width: 390, height: 844 } as const;
const DESKTOP = { width: 1280, height: 800 } as const;
const [MINE, SAMS, TAGGED, PLANNED] = ROLE_FLOWS_FLEET;
const SAFETY_NOTES =
  'Stop the engine, take the key and wait for the PTO shaft to stop before touching the guard.';
/** The smallest touch target (WCAG 2.5.5, platform guidelines): 44 CSS px. */
const TOUCH = 44;

// measured in the page, so a list that re-renders between the wait and the measure is measured
// again (a bounding box taken outside the page is null for a node just replaced)
const height = (locator: Locator) => locator.evaluate((el) => el.getBoundingClientRect().height);

describe('role flows — what new users tripped on (browser)', () => {
  let browser: TestBrowser;
  let orgId: string;
  const ids: Record<string, string> = {};
  let currency: string;
  let plan: { id: string; plannedFor: string };

  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    orgId = await farmId(page);
    const members = (await apiGet(page, `/organizations/${orgId}/members`)).data as Member[];
    const idOf = (email: string) => members.find((m) => m.user.email === email)!.user.id;
    const lena = idOf('lena@larkspur.example');
    const sam = idOf('sam@larkspur.example');
    currency = (await apiGet(page, '/me')).data.memberships.find(
      (m: { organization: { id: string } }) => m.organization.id === orgId,
    ).organization.currency;
    for (const [fleetNumber, operator] of [
      [MINE, lena],
      [SAMS, sam],
      [TAGGED, lena],
      [PLANNED, lena],
    ]) {
      const created = await page.request.post(`/api/v1/organizations/${orgId}/machines`, {
        data: {
          fleetNumber,
          name: 'Harl yard tractor',
          category: 'tractor',
          meterUnit: 'h',
          operatorIds: [operator],
        },
      });
      expect(created.status(), fleetNumber).toBe(201);
      ids[fleetNumber] = (await created.json()).data.id;
    }
    const tagged = await page.request.patch(
      `/api/v1/organizations/${orgId}/machines/${ids[TAGGED]}`,
      { data: { status: 'tagged_out' } },
    );
    expect(tagged.status()).toBe(200);

    // RF-04: a task with a hazard and its notes, planned for next Monday
    const task = await page.request.post(
      `/api/v1/organizations/${orgId}/machines/${ids[PLANNED]}/tasks`,
      {
        data: {
          name: 'PTO clutch check',
          intervalMeter: 250,
          hazards: ['pto'],
          safetyNotes: SAFETY_NOTES,
        },
      },
    );
    expect(task.status()).toBe(201);
    const monday = new Date();
    monday.setUTCDate(monday.getUTCDate() + ((8 - monday.getUTCDay()) % 7 || 7));
    const plannedFor = monday.toISOString().slice(0, 10);
    const planned = await page.request.post(
      `/api/v1/organizations/${orgId}/machines/${ids[PLANNED]}/service-records`,
      { data: { status: 'planned', plannedFor, taskIds: [(await task.json()).data.id] } },
    );
    expect(planned.status()).toBe(201);
    plan = { id: (await planned.json()).data.id, plannedFor };
    await page.close();
  });

  afterAll(async () => {
    await browser?.close();
  });

  describe('operator on a 390 px phone', () => {
    let page: Page;
    beforeAll(async () => {
      page = await browser.newPage(PHONE);
      await signIn(page, 'lena@larkspur.example', PASSWORD);
    });

    it('sign-in — lands on the walkaround with the machines assigned to her first', async () => {
      expect(new URL(page.url()).pathname).toBe(`/o/${orgId}/walkaround`);
      await page.getByRole('heading', { name: 'Daily walkaround' }).waitFor();
      const mine = page.getByRole('list', { name: 'Assigned to you' });
      await mine.getByRole('link', { name: new RegExp(`^${MINE}\\b`) }).waitFor();
      // the assigned list comes before the rest, and her machine is not among the others
      const lists = await page
        .locator('main ul[aria-label]')
        .evaluateAll((uls) => uls.map((ul) => ul.getAttribute('aria-label')));
      expect(lists.indexOf('Assigned to you')).toBe(0);
      const others = page.getByRole('list', { name: 'Other machines' });
      if (await others.count())
        expect(await others.getByText(MINE, { exact: true }).count()).toBe(0);
      await screenshot(page, 'role-flows-operator-landing');
    });

    it("a scanned label of sam's machine — says it is not hers and names the managers to ask", async () => {
      await page.goto(`/o/${orgId}/walkaround/${ids[SAMS]}`);
      const alert = page.getByRole('alert').filter({ hasText: 'Not assigned to you' });
      // the managers' names arrive with the member list, a moment after the refusal
      await alert.getByText(/Marta Quist/).waitFor();
      const text = (await alert.innerText()).replace(/\s+/g, ' ');
      expect(text).toContain(`${SAMS} is not assigned to you`);
      expect(text).toContain('Marta Quist');
      expect(await page.locator('main').innerText()).not.toMatch(/Machine not found|Try again/);
      await page.getByRole('link', { name: 'Pick one of your machines' }).waitFor();
      await screenshot(page, 'role-flows-operator-not-assigned');
    });

    it('a tagged-out machine — a tap says why, since when and whom to ask; it is no link to use', async () => {
      await page.goto(`/o/${orgId}/walkaround`);
      const mine = page.getByRole('list', { name: 'Assigned to you' });
      const card = mine.getByRole('button', { name: new RegExp(`^${TAGGED}\\b`) });
      await card.waitFor();
      expect(await mine.getByRole('link', { name: new RegExp(`^${TAGGED}\\b`) }).count()).toBe(0);
      expect(await card.getAttribute('aria-expanded')).toBe('false');
      await card.click();
      expect(await card.getAttribute('aria-expanded')).toBe('true');
      const why = mine.locator('li').filter({ hasText: TAGGED }).getByRole('definition');
      await why
        .first()
        .getByText(/Tagged out by hand/)
        .waitFor();
      const words = (await mine.locator('li').filter({ hasText: TAGGED }).innerText()).replace(
        /\s+/g,
        ' ',
      );
      expect(words).toMatch(/Since: \S/);
      expect(words).not.toContain('Since: not recorded');
      expect(words).toMatch(/Who to ask: .*Dev Okafor/);
      expect(words).toContain('Marta Quist');
      await screenshot(page, 'role-flows-operator-tagged-out');
      // its walkaround still refuses use, with the same explanation
      await page.goto(`/o/${orgId}/walkaround/${ids[TAGGED]}`);
      await page.getByRole('alert').filter({ hasText: 'Tagged out — do not use' }).waitFor();
      await page.getByText('Who to ask:').waitFor();
      expect(await page.getByRole('radiogroup').count()).toBe(0);
    });

    it('a long checklist — sections fold when answered, a count, and "the rest OK" only once each item was shown', async () => {
      await page.goto(`/o/${orgId}/walkaround/${ids[MINE]}`);
      await page.getByRole('heading', { name: `Walkaround · ${MINE}` }).waitFor();
      const checklist = await apiGet(
        page,
        `/organizations/${orgId}/machines/${ids[MINE]}/checklist?purpose=use`,
      );
      const items = checklist.data.items as { id: string; label: string }[];
      expect(items.length, 'the tractor list is a long one').toBeGreaterThan(12);
      const total = items.length;
      const progress = page.getByRole('status').filter({ hasText: /answered$/ });
      expect(await progress.innerText()).toBe(`0 of ${total} answered`);

      const first = page.getByRole('region', {
        name: /^Before start — engine off, key out · items 1–6/,
      });
      const restOk = first.getByRole('button', { name: /^Mark the rest of this section OK/ });
      // the first item is a finding, entered by hand; the rest are not offered yet
      await first
        .getByRole('radiogroup', { name: items[0].label, exact: true })
        .getByRole('radio', { name: 'Attention', exact: true })
        .check();
      expect(await restOk.count()).toBe(0);
      for (const item of items.slice(1, 6))
        await first
          .getByRole('radiogroup', { name: item.label, exact: true })
          .scrollIntoViewIfNeeded();
      await restOk.waitFor();
      expect(await restOk.innerText()).toContain('(5)');
      await restOk.click();
      expect(await progress.innerText()).toBe(`6 of ${total} answered`);
      // bulk answers are OK only: the attention stays, and its section stays open for the note
      expect(
        await first
          .getByRole('radiogroup', { name: items[0].label, exact: true })
          .getByRole('radio', { name: 'Attention', exact: true })
          .isChecked(),
      ).toBe(true);
      for (const item of items.slice(1, 6))
        expect(
          await first
            .getByRole('radiogroup', { name: item.label, exact: true })
            .getByRole('radio', { name: 'OK', exact: true })
            .isChecked(),
        ).toBe(true);
      const firstToggle = first.getByRole('button', {
        name: /^Before start — engine off, key out · items 1–6/,
      });
      expect(await firstToggle.getAttribute('aria-expanded')).toBe('true');

      // the second section, answered one by one, folds away once its last item is answered
      const second = page.getByRole('region', {
        name: /^Before start — engine off, key out · items 7–12/,
      });
      const secondToggle = second.getByRole('button', {
        name: /^Before start — engine off, key out · items 7–12/,
      });
      for (const item of items.slice(6, 12))
        await second
          .getByRole('radiogroup', { name: item.label, exact: true })
          .getByRole('radio', { name: 'OK', exact: true })
          .check();
      expect(await secondToggle.getAttribute('aria-expanded')).toBe('false');
      expect(await secondToggle.innerText()).toContain('6 of 6 answered · all OK');
      expect(await second.getByRole('radiogroup').count()).toBe(0);
      expect(await progress.innerText()).toBe(`12 of ${total} answered`);
      await screenshot(page, 'role-flows-operator-checklist');
      await secondToggle.click();
      await second.getByRole('radiogroup', { name: items[6].label, exact: true }).waitFor();
    });
  });

  it('technician — the shop week records a planned visit, shows its caution in full, and costs say their currency', async () => {
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'dev@larkspur.example', PASSWORD);
    await page.goto(`/o/${orgId}/shop?start=${plan.plannedFor}`);
    // the innermost list items: a day's list holds its visits' and due rows' items
    const cards = page.locator('main li:not(:has(li))');
    // the visit's card: the innermost item holding its "Record service" (its caution is a list too)
    const card = page
      .locator('main li')
      .filter({ has: page.getByRole('link', { name: new RegExp(`^Record service: ${PLANNED},`) }) })
      .last();
    await card.waitFor();
    const caution = card.getByRole('complementary', { name: 'Safety cautions' });
    const words = (await caution.innerText()).replace(/\s+/g, ' ');
    expect(words).toContain('PTO clutch check');
    expect(words).toContain(SAFETY_NOTES);
    expect(words).toMatch(/operator's manual/);
    // every due row not booked yet offers both: plan it, or record it now
    const unbooked = cards.filter({ hasText: 'Not booked' });
    for (let i = 0; i < (await unbooked.count()); i++)
      expect(
        await unbooked
          .nth(i)
          .getByRole('link', { name: /^Record service: / })
          .count(),
      ).toBe(1);
    await screenshot(page, 'role-flows-technician-shop-week');
    await card.getByRole('link', { name: /^Record service: / }).click();
    await page.waitForURL((url) => url.pathname.endsWith(`/machines/${ids[PLANNED]}/services/new`));
    expect(new URL(page.url()).searchParams.get('complete')).toBe(plan.id);
    await page.getByRole('button', { name: 'Add part' }).click();
    await page.getByLabel(`Unit cost (${currency})`, { exact: true }).first().waitFor();
    await page.close();
  });

  it('machine links in lists — touch targets of at least 44 px on a phone and a desktop', async () => {
    const page = await browser.newPage(PHONE);
    await signIn(page, 'marta@larkspur.example', PASSWORD);
    await page.goto(`/o/${orgId}`);
    const dueLink = page
      .locator('main')
      .getByRole('link', { name: /^[A-Z]+-\d+\b/ })
      .first();
    await dueLink.waitFor();
    expect(await height(dueLink)).toBeGreaterThanOrEqual(TOUCH);
    await page.goto(`/o/${orgId}/defects`);
    const defectLink = page.locator('main').getByRole('link', { name: /^[A-Z]+-\d+ · / });
    await defectLink.first().waitFor();
    expect(await height(defectLink.first())).toBeGreaterThanOrEqual(TOUCH);
    await page.setViewportSize(DESKTOP);
    await page.goto(`/o/${orgId}`);
    const tableLink = page.getByRole('table').getByRole('link').first();
    await tableLink.waitFor();
    expect(await height(tableLink)).toBeGreaterThanOrEqual(TOUCH);
    await page.goto(`/o/${orgId}/machines`);
    // the first fleet-number link on screen (a narrow variant of the list may sit hidden beside it)
    const fleetLink = page
      .getByRole('table')
      .locator('a:visible')
      .filter({ hasText: /^[A-Z]+-\d+$/ })
      .first();
    await fleetLink.waitFor();
    expect(await height(fleetLink)).toBeGreaterThanOrEqual(TOUCH);
    await page.close();
  });
});
