// The checks the screens browser test makes on each page: waiting for it to settle, fit at the
// viewport's width, icons, words where codes show, and axe-core's serious findings.
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axeSource: string = (createRequire(import.meta.url)('axe-core') as { source: string }).source;

/** Waits until the page has its heading and no loading placeholder is left. */
export async function settle(page: Page) {
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
export async function fitProblems(page: Page, keyColumns: readonly string[]): Promise<string[]> {
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

    // why an element is not fully inside the window and every box that clips it (an overflow
    // scroll box), in words with the pixels it misses by; null when it is shown
    const cut = (el: Element): string | null => {
      const box = el.getBoundingClientRect();
      if (box.width === 0) return 'not laid out';
      if (box.left < -0.5 || box.right > window.innerWidth + 0.5)
        return `spans ${Math.round(box.left)}–${Math.round(box.right)} px of a ${window.innerWidth} px window`;
      for (let up = el.parentElement; up; up = up.parentElement) {
        const style = getComputedStyle(up);
        if (style.overflowX === 'visible') continue;
        const clip = up.getBoundingClientRect();
        if (box.left < clip.left - 0.5 || box.right > clip.right + 0.5)
          return `ends at ${box.right.toFixed(1)} px, its scroll box (${up.tagName.toLowerCase()}, ${up.scrollWidth} px of content in ${up.clientWidth}) at ${clip.right.toFixed(1)} px`;
      }
      return null;
    };
    const shown = (el: Element) => cut(el) === null;
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
      else if (!candidates.some(shown))
        problems.push(`"${key}" column cut off: ${cut(candidates[0]!)}`);
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
export async function iconProblems(page: Page): Promise<string[]> {
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
export async function wordProblems(page: Page): Promise<string[]> {
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
export async function axeProblems(page: Page): Promise<string[]> {
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
