// Chromium for the `client` bench part (playwright-core, Debian's /usr/bin/chromium, nothing
// downloaded): the throttled phone profile set through the DevTools protocol, and one timed
// navigation, from its start to the due list on screen.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import {
  chromium,
  type Browser,
  type BrowserContext,
  type CDPSession,
  type Page,
} from 'playwright-core';
// the browser tests' flags: without the background-networking ones chromium keeps calling out
import { CHROMIUM_ARGS } from '../../tests/e2e/support/browser';

/**
 * The phone on a poor connection: 150 ms round trip, 1.6 Mbit/s down, 750 kbit/s up, the
 * CPU slowed 4× (the figures of Lighthouse's "slow 4G" mobile profile, from memory). DevTools
 * takes throughput in bytes per second.
 */
export const THROTTLE = {
  latencyMs: 150,
  downloadBitsPerSecond: 1_600_000,
  uploadBitsPerSecond: 750_000,
  cpuSlowdown: 4,
} as const;

const NETWORK_CONDITIONS = {
  offline: false,
  latency: THROTTLE.latencyMs,
  downloadThroughput: THROTTLE.downloadBitsPerSecond / 8,
  uploadThroughput: THROTTLE.uploadBitsPerSecond / 8,
};
const UNTHROTTLED = { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 };

/** A phone held upright: the due list shows as cards, a list named "Due services". */
const PHONE = { width: 360, height: 740 };
/** What "the due list is visible" means, on the dashboard and on the static page alike. */
const DUE_LIST_ROW = '[aria-label="Due services"] > li';
const VISIT_TIMEOUT_MS = 60_000;

export interface BenchBrowser {
  browser: Browser;
  /** the browser's own DevTools session: reaches the service worker's target */
  cdp: CDPSession;
  close(): Promise<void>;
}

export async function launchChromium(): Promise<BenchBrowser> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const cdp = await browser.newBrowserCDPSession();
  return { browser, cdp, close: () => browser.close() };
}

/** A fresh context (its own cache, cookies and storage) with one phone-sized page. */
export async function phonePage(
  browser: Browser,
  serviceWorkers: 'allow' | 'block',
): Promise<{ context: BrowserContext; page: Page; session: CDPSession }> {
  const context = await browser.newContext({ viewport: PHONE, serviceWorkers });
  // Marks the moment the first due-list row is in the page, in the page's own clock: ms since
  // the navigation started (performance.now() counts from the document's time origin).
  // (A string, not a function: tsx's name helper would not exist in the page.)
  await context.addInitScript(`(() => {
    const check = () => {
      if (window.__dueVisibleAt === undefined && document.querySelector(${JSON.stringify(DUE_LIST_ROW)})) {
        window.__dueVisibleAt = performance.now();
        observer.disconnect();
      }
    };
    const observer = new MutationObserver(check);
    observer.observe(document, { childList: true, subtree: true });
  })()`);
  const page = await context.newPage();
  const session = await context.newCDPSession(page);
  await session.send('Network.enable');
  return { context, page, session };
}

/** Signs in through the form, unthrottled, and returns the dashboard the app opened. */
export async function signIn(page: Page, origin: string, email: string, password: string) {
  await page.goto(`${origin}/sign-in`);
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => /^\/o\/[^/]+$/.test(url.pathname), { timeout: VISIT_TIMEOUT_MS });
  return page.url();
}

/** Empties the HTTP cache, Cache Storage and service workers of the origin (cookies stay). */
export async function emptyCaches(session: CDPSession, origin: string) {
  await session.send('Network.clearBrowserCache');
  await session.send('Storage.clearDataForOrigin', {
    origin,
    storageTypes: 'cache_storage,service_workers',
  });
}

/**
 * The origin's service workers, each attached through the browser's session and kept attached
 * while throttled (a page's session does not reach the worker, whose own fetches — the API
 * answers it relays — would go out unthrottled; and a target's emulation ends with the session
 * that set it). Returns the attached sessions.
 */
async function attachWorkers(bench: BenchBrowser, origin: string): Promise<string[]> {
  const { targetInfos } = await bench.cdp.send('Target.getTargets');
  const workers = targetInfos.filter(
    (t) => t.type === 'service_worker' && t.url.startsWith(origin),
  );
  const sessions: string[] = [];
  for (const worker of workers) {
    const { sessionId } = await bench.cdp.send('Target.attachToTarget', {
      targetId: worker.targetId,
      flatten: false,
    });
    sessions.push(sessionId);
    await workerCommand(bench.cdp, sessionId, 'Network.enable', {});
  }
  return sessions;
}

let nextId = 1;

/** One command on an attached (non-flat) target session; rejects with the target's error. */
function workerCommand(cdp: CDPSession, sessionId: string, method: string, params: object) {
  const id = nextId++;
  return new Promise<void>((resolve, reject) => {
    const onMessage = (event: { sessionId: string; message: string }) => {
      if (event.sessionId !== sessionId) return;
      const reply = JSON.parse(event.message) as { id?: number; error?: { message: string } };
      if (reply.id !== id) return;
      cdp.off('Target.receivedMessageFromTarget', onMessage);
      if (reply.error) reject(new Error(`${method} on the service worker: ${reply.error.message}`));
      else resolve();
    };
    cdp.on('Target.receivedMessageFromTarget', onMessage);
    cdp
      .send('Target.sendMessageToTarget', {
        sessionId,
        message: JSON.stringify({ id, method, params }),
      })
      .catch(reject);
  });
}

/** The worker sessions the phone profile is set on now (lifted and detached by the next call). */
let throttledWorkers: string[] = [];

/** Sets (or lifts) the phone profile on the page and on the origin's service workers. */
export async function setThrottling(
  bench: BenchBrowser,
  session: CDPSession,
  origin: string,
  on: boolean,
): Promise<{ workers: number }> {
  for (const sessionId of throttledWorkers) {
    await workerCommand(bench.cdp, sessionId, 'Network.emulateNetworkConditions', UNTHROTTLED);
    await bench.cdp.send('Target.detachFromTarget', { sessionId });
  }
  throttledWorkers = [];
  const conditions = on ? NETWORK_CONDITIONS : UNTHROTTLED;
  await session.send('Network.emulateNetworkConditions', conditions);
  await session.send('Emulation.setCPUThrottlingRate', { rate: on ? THROTTLE.cpuSlowdown : 1 });
  if (!on) return { workers: 0 };
  throttledWorkers = await attachWorkers(bench, origin);
  for (const sessionId of throttledWorkers)
    await workerCommand(bench.cdp, sessionId, 'Network.emulateNetworkConditions', conditions);
  return { workers: throttledWorkers.length };
}

export interface Visit {
  /** ms from the navigation's start to the first due-list row in the page */
  ms: number;
  /** whether a service worker answered the navigation */
  controlled: boolean;
  consoleErrors: string[];
  /** the page's own timings up to the due list: the document, then each file and API call */
  timeline: string;
  /** JavaScript that came over the network before the due list, kB as sent (gzip or brotli) */
  scriptKb: number;
}

/**
 * Navigates `page` to `url` and waits for the due list. When it does not come, the screenshot
 * (.screenshots/bench-client-<label>.png) and the console say why.
 */
export async function timedVisit(page: Page, url: string, label: string): Promise<Visit> {
  const consoleErrors: string[] = [];
  const onConsole = (m: { type(): string; text(): string }) => {
    if (m.type() === 'error') consoleErrors.push(m.text());
  };
  const onError = (e: Error) => consoleErrors.push(e.message);
  page.on('console', onConsole);
  page.on('pageerror', onError);
  try {
    await page.goto(url, { waitUntil: 'commit', timeout: VISIT_TIMEOUT_MS });
    const handle = await page
      // a function, not a string: the app's CSP refuses eval
      .waitForFunction(() => (window as { __dueVisibleAt?: number }).__dueVisibleAt, undefined, {
        timeout: VISIT_TIMEOUT_MS,
        polling: 100,
      })
      .catch(async (error: Error) => {
        const shot = await saveScreenshot(page, label);
        throw new Error(
          `${label}: no due list at ${page.url()} (${error.message.split('\n')[0]}); ` +
            `screenshot ${shot}; console: ${consoleErrors.join(' | ') || 'no errors'}`,
        );
      });
    const ms = Number(await handle.jsonValue());
    const controlled = await page.evaluate(() => Boolean(navigator.serviceWorker?.controller));
    const timeline = await pageTimeline(page, ms);
    const scriptKb = await page.evaluate(
      (until) =>
        (performance.getEntriesByType('resource') as PerformanceResourceTiming[])
          .filter((e) => e.startTime <= until && new URL(e.name).pathname.endsWith('.js'))
          .reduce((sum, e) => sum + e.encodedBodySize, 0) / 1000,
      ms,
    );
    return { ms, controlled, consoleErrors, timeline, scriptKb };
  } finally {
    page.off('console', onConsole);
    page.off('pageerror', onError);
  }
}

/**
 * The document, then each file and API call that started by `until` (ms): start–end; an API
 * call without the organization's id, a file without its folder. (No named function inside:
 * tsx's name helper would not exist in the page.)
 */
const pageTimeline = (page: Page, until: number) =>
  page.evaluate((until) => {
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
    const calls = (performance.getEntriesByType('resource') as PerformanceResourceTiming[])
      .filter((e) => e.startTime <= until)
      .map((e) => {
        const url = new URL(e.name);
        const name = url.pathname
          .replace(/^\/api\/v1\/organizations\/[^/]+/, '…')
          .replace(/^\/assets\//, '');
        return `${name}${url.search} ${e.startTime.toFixed(0)}–${e.responseEnd.toFixed(0)}`;
      });
    const head = `document –${nav.responseEnd.toFixed(0)}, DOM ready ${nav.domContentLoadedEventEnd.toFixed(0)}`;
    return [head, ...calls].join('; ');
  }, until);

async function saveScreenshot(page: Page, label: string): Promise<string> {
  const dir = path.resolve(import.meta.dirname, '..', '..', '.screenshots');
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `bench-client-${label}.png`);
  await page.screenshot({ path: file, fullPage: true }).catch(() => undefined);
  return path.relative(process.cwd(), file);
}
