// Chromium for the browser tests, driven with playwright-core (it downloads nothing: the browser
// is Debian's chromium, which `npm test` installs when missing).
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** The app under test; scripts/test.mjs starts the API with the built client there. */
export const baseUrl = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:4311';

/** A small phone held upright, for the operator's screens. */
export const PHONE_VIEWPORT = { width: 360, height: 740 } as const;

export type Viewport = { width: number; height: number };

export type TestBrowser = {
  context: BrowserContext;
  baseUrl: string;
  newPage(viewport?: Viewport): Promise<Page>;
  close(): Promise<void>;
};

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const screenshotDir = path.join(projectRoot, '.screenshots');

// Without the background-networking flags chromium keeps trying to reach the (closed) network.
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/**
 * Starts chromium with a fresh profile. A persistent context is used because launch() refuses
 * --user-data-dir; the profile folder is removed again by close(). The app's service worker is
 * blocked unless a test asks for it (offline.e2e.ts): page.route() does not see the requests a
 * service worker answers, and the other tests check the pages, not the offline copy.
 */
export async function launchBrowser(
  options: { serviceWorkers?: 'allow' | 'block' } = {},
): Promise<TestBrowser> {
  const profileDir = await mkdtemp(path.join(tmpdir(), 'hourstone-e2e-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
    baseURL: baseUrl,
    serviceWorkers: options.serviceWorkers ?? 'block',
  });
  return {
    context,
    baseUrl,
    async newPage(viewport?: Viewport) {
      const page = await context.newPage();
      if (viewport) await page.setViewportSize(viewport);
      return page;
    },
    async close() {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}

/** Signs in through the sign-in form, as a person would, and waits to leave /sign-in. */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  // The profile is shared by every page of the run: start each sign-in signed out, on a freshly
  // loaded sign-in page (a page left on /sign-in by the previous test may still be settling its
  // session query, or be redirected there by a late 401, and not show the form yet).
  await page.context().clearCookies();
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** Saves a full-page screenshot as .screenshots/<name>.png (git-ignored); returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  await mkdir(screenshotDir, { recursive: true });
  const file = path.join(screenshotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Collects uncaught page errors and console errors, for tests that expect a clean page. */
export function collectPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(error.message));
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  return errors;
}
