import { createRequire } from 'node:module';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
  type Viewport,
} from './support/browser';

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

const axeSource: string = (createRequire(import.meta.url)('axe-core') as { source: string }).source;

/** Waits until the page has its heading and no loading placeholder is left. */
async function settle(page: Page) {
  await page.locator('main h1').first().waitFor({ state: 'visible', timeout: 15000 });
  await page.waitForFunction(
    () =>
      !document.querySelector(
        'main [aria-busy="true"], main .animate-pulse, main [role="progressbar"]',
      ),
    undefined,
    { timeout: 15000 },
  );
  // one more frame for charts measuring their box
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => done(null))));
}

/** What is wrong with the page's fit at this width, in words (empty: it fits). */
async function fitProblems(page: Page, keyColumns: readonly string[]): Promise<string[]> {
  return page.evaluate((keys) => {
    const problems: string[] = [];
    const root = document.scrollingElement ?? document.documentElement;
    if (root.scrollWidth > window.innerWidth) {
      // name the innermost element past the edge, to say what to fix
      const past = [...document.querySelectorAll('body *')].filter(
        (el) =>
          el.getBoundingClientRect().right > window.innerWidth + 0.5 &&
          ![...el.children].some((c) => c.getBoundingClientRect().right > window.innerWidth + 0.5),
      );
      const what = past[0]
        ? `${past[0].tagName.toLowerCase()} "${past[0].textContent?.trim().slice(0, 40)}"`
        : 'unknown';
      problems.push(
        `scrolls sideways: ${root.scrollWidth} px wide in ${window.innerWidth} px (${what})`,
      );
    }

    // fully inside the window and inside every box that clips it (an overflow scroll box)
    const shown = (el: Element) => {
      const box = el.getBoundingClientRect();
      if (box.width === 0 || box.left < -0.5 || box.right > window.innerWidth + 0.5) return false;
      for (let up = el.parentElement; up; up = up.parentElement) {
        const style = getComputedStyle(up);
        if (style.overflowX === 'visible') continue;
        const clip = up.getBoundingClientRect();
        if (box.left < clip.left - 0.5 || box.right > clip.right + 0.5) return false;
      }
      return true;
    };
    for (const item of document.querySelectorAll('nav[aria-label="Main"] :is(a, button)')) {
      if (!shown(item)) problems.push(`navigation "${item.textContent?.trim()}" off screen`);
    }
    const main = document.querySelector('main');
    for (const key of keys) {
      // a column heading, or the label of the same figure on a phone's card
      const candidates = [...(main?.querySelectorAll('*') ?? [])].filter(
        (el) =>
          el.textContent?.trim() === key &&
          ![...el.children].some((child) => child.textContent?.trim() === key),
      );
      if (candidates.length === 0) problems.push(`no "${key}" column`);
      else if (!candidates.some(shown)) problems.push(`"${key}" column cut off`);
    }
    return problems;
  }, keyColumns);
}

// Icons whose meaning is fixed elsewhere in the app: a padlock is a tag-out, an arrow out of a box
// opens another tab, a plus adds, a circling arrow retries, a cross closes or clears.
const ICONS_WITH_ANOTHER_MEANING = [
  'lock',
  'external',
  'plus',
  'refresh',
  'close',
  'trash',
  'back',
];

/** Icons that do not mean what they label: in the main navigation, on downloads, on new tabs. */
async function iconProblems(page: Page): Promise<string[]> {
  return page.evaluate((reserved) => {
    const problems: string[] = [];
    const iconOf = (el: Element) => el.querySelector('svg[data-icon]')?.getAttribute('data-icon');
    const seen = new Map<string, string>();
    for (const item of document.querySelectorAll('nav[aria-label="Main"] a')) {
      const label = item.textContent?.trim() ?? '';
      const icon = iconOf(item);
      if (!icon) continue;
      if (reserved.includes(icon)) problems.push(`navigation "${label}" has the ${icon} icon`);
      if (seen.has(icon))
        problems.push(`navigation "${label}" shares its icon with "${seen.get(icon)}"`);
      seen.set(icon, label);
    }
    for (const link of document.querySelectorAll('main a[download]')) {
      const icon = iconOf(link);
      if (icon && icon !== 'download')
        problems.push(`download "${link.textContent?.trim()}" has the ${icon} icon`);
    }
    for (const link of document.querySelectorAll('main a')) {
      if (iconOf(link) === 'external' && link.getAttribute('target') !== '_blank')
        problems.push(`"${link.textContent?.trim()}" has the new-tab icon but opens in place`);
    }
    return problems;
  }, ICONS_WITH_ANOTHER_MEANING);
}

/** Codes and field names on screen where a person should read words (what new users tripped on). */
async function wordProblems(page: Page): Promise<string[]> {
  const text = await page.locator('main').innerText();
  const codes: [string, RegExp][] = [
    [
      'a time zone database name',
      /\b(?:America|Europe|Africa|Asia|Australia|Pacific|Atlantic)\/[A-Z]\w+/,
    ],
    [
      'an audit code',
      /\b(?:machine|defect|service|booking|dealer_link|dealer|reading|task)\.[a-z]+(?:_[a-z]+)*\b/,
    ],
    ['an API path', /\b(?:machines|service-records|readings)\/[a-z-]+/],
    ['a field name', /\b[a-z]+[A-Z][a-z]+(?:[A-Z][a-z]+)*\b/],
    ['"Service: Service"', /Service: Service\b/],
  ];
  return codes.flatMap(([what, pattern]) => {
    const found = pattern.exec(text);
    const around = found ? text.slice(Math.max(0, found.index - 40), found.index + 40) : '';
    return found ? [`shows ${what}: "${found[0]}" in "${around.replace(/\s+/g, ' ')}"`] : [];
  });
}

/** axe-core's serious and critical findings on the page, one line each. */
async function axeProblems(page: Page): Promise<string[]> {
  // evaluated, not added as a script tag: the app's Content-Security-Policy refuses inline scripts
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(axeSource);
  return page.evaluate(async () => {
    type Result = {
      violations: { id: string; impact?: string; nodes: { target: unknown[] }[] }[];
    };
    const axe = (window as unknown as { axe: { run(ctx: Document): Promise<Result> } }).axe;
    const result = await axe.run(document);
    return result.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map(
        (v) =>
          `${v.impact} ${v.id}: ${v.nodes
            .slice(0, 3)
            .map((n) => n.target.join(' '))
            .join(' | ')}`,
      );
  });
}

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
