import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
  type Viewport,
} from './support/browser';
import {
  axeProblems,
  fitProblems,
  iconProblems,
  settle,
  wordProblems,
} from './support/screen-checks';

// Every main page of each demo role (README "Demo sign-ins"), on a small phone, a common phone and
// a laptop with the side bar: nothing scrolls sideways, the columns a person reads the page for
// are on screen (not cut by a scroll box), icons mean what they label, and axe-core finds nothing
// serious or critical (issue 10, "What new users tripped on").
// Read only: the file writes nothing to the shared demo.

const PASSWORD = 'hourstone-demo';
const VIEWPORTS: Record<string, Viewport> = {
  'phone 360': { width: 360, height: 740 },
  'phone 390': { width: 390, height: 844 },
  'laptop 1366': { width: 1366, height: 768 },
};
/** axe on the narrowest and the widest layout (390 px lays out as 360 px does). */
const AXE_ON = new Set(['phone 360', 'laptop 1366']);

/** A page to visit: its path below /o/<orgId>, and the words that must be fully on screen. */
interface Visit {
  name: string;
  path: string;
  /** texts (column headings, or their card labels on a phone) that must be shown, not cut */
  keyColumns?: string[];
}

const FARM_PAGES: Record<string, Visit> = {
  dashboard: { name: 'Dashboard', path: '', keyColumns: ['Due at', 'Projected', 'Remaining'] },
  fleet: { name: 'Fleet', path: '/machines', keyColumns: ['Meter', 'Next due'] },
  logHours: { name: 'Log hours', path: '/log-hours' },
  defects: { name: 'Defects', path: '/defects' },
  shopWeek: { name: 'Shop week', path: '/shop' },
  team: { name: 'Team', path: '/team' },
  dealers: { name: 'Dealers', path: '/dealers' },
  reminders: { name: 'Reminders', path: '/reminders' },
  messages: { name: 'Messages', path: '/messages' },
  checklists: { name: 'Checklists', path: '/checklists' },
  walkaround: { name: 'Walkaround', path: '/walkaround' },
  settings: { name: 'Settings', path: '/settings' },
  account: { name: 'Account', path: '/account' },
  // T-01, or the first machine the person sees (an operator sees the machines assigned to them)
  machine: { name: 'Machine page', path: 'machine:T-01' },
};

const ROLES = [
  {
    role: 'manager',
    who: 'marta@larkspur.example',
    pages: Object.values(FARM_PAGES),
  },
  {
    role: 'technician',
    who: 'dev@larkspur.example',
    pages: ['dashboard', 'shopWeek', 'defects', 'fleet', 'logHours', 'walkaround']
      .concat(['reminders', 'account', 'machine'])
      .map((id) => FARM_PAGES[id]!),
  },
  {
    role: 'operator',
    who: 'lena@larkspur.example',
    pages: ['walkaround', 'logHours', 'fleet', 'dashboard', 'defects', 'reminders']
      .concat(['account', 'machine'])
      .map((id) => FARM_PAGES[id]!),
  },
  {
    role: 'advisor',
    who: 'ravi@quillon.example',
    pages: [
      { name: 'Dashboard', path: '' },
      { name: 'Board', path: '/board', keyColumns: ['Due at', 'Falls due', 'Last reading'] },
      { name: 'Parts forecast', path: '/parts' },
      { name: 'Bookings', path: '/bookings' },
      { name: 'Customers', path: '/customers' },
      { name: 'Settings', path: '/settings' },
      { name: 'Account', path: '/account' },
    ] satisfies Visit[],
  },
] as const;

describe('every main page fits its screen and passes axe (browser)', () => {
  let browser: TestBrowser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('sign-up at 360 px — a long address in "Check your e-mail" breaks inside the box', async () => {
    // a fresh address (no account is made until its link is opened): nothing of the demo changes
    const address = `a-very-long-newcomer-address-${Date.now()}@tallowmere-and-larkspur-hollow.example`;
    const page = await browser.newPage(VIEWPORTS['phone 360']);
    await page.context().clearCookies();
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Petra Lindqvist');
    await page.getByLabel('Email', { exact: true }).fill(address);
    await page.getByLabel('Password', { exact: true }).fill('a-long-newcomer-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    const box = page.getByRole('status').filter({ hasText: 'Check your e-mail' });
    await box.waitFor();
    await screenshot(page, 'fit-phone-360-sign-up-sent');
    const fit = await box.evaluate((el, text) => {
      const outer = el.getBoundingClientRect();
      const shown = [...el.querySelectorAll('*')].find((n) => n.textContent === text);
      const inner = shown?.getBoundingClientRect();
      return {
        found: Boolean(shown),
        inside: inner ? inner.right <= outer.right + 0.5 : false,
        pageWidth: document.scrollingElement?.scrollWidth ?? 0,
      };
    }, address);
    expect(fit).toEqual({ found: true, inside: true, pageWidth: 360 });
    await page.close();
  });

  for (const [label, viewport] of Object.entries(VIEWPORTS)) {
    for (const r of ROLES) {
      it(`${label} — ${r.role}: no page scrolls sideways, key columns shown${AXE_ON.has(label) ? ', no serious axe finding' : ''}`, async () => {
        const page = await browser.newPage(viewport);
        await signIn(page, r.who, PASSWORD);
        const orgPath = new URL(page.url()).pathname.match(/^\/o\/[^/]+/)?.[0];
        expect(orgPath).toBeTruthy();
        const problems: string[] = [];
        for (const visit of r.pages as readonly Visit[]) {
          let path = `${orgPath}${visit.path}`;
          if (visit.path.startsWith('machine:')) {
            await page.goto(`${orgPath}/machines`);
            const fleetNumber = visit.path.slice('machine:'.length);
            await page.waitForFunction(() =>
              [...document.querySelectorAll<HTMLAnchorElement>('main a[href]')].some((a) =>
                /\/machines\/[0-9a-f-]{36}$/.test(a.pathname),
              ),
            );
            path = await page.evaluate((fleet) => {
              const links = [
                ...document.querySelectorAll<HTMLAnchorElement>('main a[href]'),
              ].filter((a) => /\/machines\/[0-9a-f-]{36}$/.test(a.pathname));
              const named = links.find((a) => a.textContent?.trim().startsWith(fleet));
              return (named ?? links[0])?.pathname ?? '';
            }, fleetNumber);
            expect(path).toMatch(/\/machines\//);
          }
          await page.goto(path);
          await settle(page);
          const found = [
            ...(await fitProblems(page, visit.keyColumns ?? [])),
            ...(await iconProblems(page)),
            ...(await wordProblems(page)),
            ...(AXE_ON.has(label) ? await axeProblems(page) : []),
          ];
          problems.push(...found.map((p) => `${visit.name}: ${p}`));
          const chart = page.locator('main figure').filter({ hasText: /Meter from|One reading/ });
          if (await chart.count())
            await chart.first().screenshot({
              path: `.screenshots/fit-${label.replace(' ', '-')}-${r.role}-chart.png`,
            });
          await screenshot(
            page,
            `fit-${label.replace(' ', '-')}-${r.role}-${visit.name.replace(/\W+/g, '-')}`,
          );
        }
        expect(problems).toEqual([]);
        await page.close();
      }, 180000);
    }
  }
});
