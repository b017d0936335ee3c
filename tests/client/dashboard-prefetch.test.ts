// The dashboard's first load (dashboard-loader.ts): on a cold start the due list and daily care of
// a farm opened here before are asked for beside the session, not one round trip after it; the
// bookings and the first-run checklist as soon as the session names a role that sees them; a guess
// never replaces the session's word.
// Node has no localStorage: the test gives the modules a small in-memory one and a fake fetch that
// holds the session's answer back until the test lets it go.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';

const ORG = '7d3c9a52-6f0e-4a51-9d47-3b1c2e8f0a11';

function memoryStorage() {
  const map = new Map<string, string>();
  return {
    getItem: (key: string) => map.get(key) ?? null,
    setItem: (key: string, value: string) => void map.set(key, value),
    removeItem: (key: string) => void map.delete(key),
  };
}

let role = 'manager';
const me = (kind: 'farm' | 'dealer') => ({
  user: { id: 'u-1', name: 'Marta', email: 'marta@example.test' },
  memberships: [{ role, organization: { id: ORG, name: 'Test farm', kind } }],
});
const json = (body: unknown) =>
  new Response(JSON.stringify(body), {
    status: 200,
    headers: { 'content-type': 'application/json' },
  });

let asked: string[];
let releaseMe: (kind: 'farm' | 'dealer') => void;

beforeEach(() => {
  asked = [];
  role = 'manager';
  vi.stubGlobal('localStorage', memoryStorage());
  const meAnswer = new Promise<'farm' | 'dealer'>((resolve) => (releaseMe = resolve));
  vi.stubGlobal('fetch', async (url: string) => {
    asked.push(url);
    if (url.endsWith('/session')) return json({ data: { signedIn: true, me: me(await meAnswer) } });
    return json({ data: [], meta: {} });
  });
  vi.resetModules();
});
afterEach(() => vi.unstubAllGlobals());

async function startDashboard() {
  const { dashboardLoader } = await import('../../src/app/routes/dashboard-loader');
  const request = new Request(`http://hourstone.test/o/${ORG}`);
  const loading = dashboardLoader(new QueryClient())({
    request,
    params: { orgId: ORG },
  } as unknown as LoaderFunctionArgs);
  await new Promise((resolve) => setTimeout(resolve, 0));
  // wrapped: an async function returning the promise itself would wait for it
  return { loading };
}
const dueAsked = () => asked.filter((url) => url.includes(`/organizations/${ORG}/due?`)).length;
const askedFor = (tail: string) =>
  asked.filter((url) => url.endsWith(`/organizations/${ORG}/${tail}`)).length;

describe('dashboard loader — due list beside the session', () => {
  it('a farm opened here before: the due list is asked for while the session is still on its way, once', async () => {
    const { rememberOrganization } = await import('../../src/lib/auth');
    rememberOrganization(ORG, 'farm');
    const { loading } = await startDashboard();
    expect(asked.some((url) => url.endsWith('/session'))).toBe(true);
    expect(dueAsked()).toBe(1);
    releaseMe('farm');
    await loading;
    expect(dueAsked()).toBe(1);
  });

  it('an organization never opened here: the due list waits for the session', async () => {
    const { loading } = await startDashboard();
    expect(dueAsked()).toBe(0);
    releaseMe('farm');
    await loading;
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(dueAsked()).toBe(1);
  });

  it('remembered as a dealer: no due list is asked for at all', async () => {
    const { rememberOrganization } = await import('../../src/lib/auth');
    rememberOrganization(ORG, 'dealer');
    const { loading } = await startDashboard();
    expect(dueAsked()).toBe(0);
    releaseMe('dealer');
    await loading.catch(() => undefined);
    expect(dueAsked()).toBe(0);
  });

  it('a farm opened here before: daily care is asked for beside the session too, once', async () => {
    const { rememberOrganization } = await import('../../src/lib/auth');
    rememberOrganization(ORG, 'farm');
    const { loading } = await startDashboard();
    expect(askedFor('daily-care')).toBe(1);
    releaseMe('farm');
    await loading;
    expect(askedFor('daily-care')).toBe(1);
  });

  it("a farm's manager: bookings and the first-run checklist are asked for once the session names the role, not before", async () => {
    const { rememberOrganization } = await import('../../src/lib/auth');
    rememberOrganization(ORG, 'farm');
    const { loading } = await startDashboard();
    expect(askedFor('bookings') + askedFor('first-run-checklist')).toBe(0);
    releaseMe('farm');
    await loading;
    expect(askedFor('bookings')).toBe(1);
    expect(askedFor('first-run-checklist')).toBe(1);
  });

  it("a farm's operator: neither bookings nor the first-run checklist is asked for (the page shows neither)", async () => {
    role = 'operator';
    const { loading } = await startDashboard();
    releaseMe('farm');
    await loading;
    expect(dueAsked()).toBe(1);
    expect(askedFor('daily-care')).toBe(1);
    expect(askedFor('bookings') + askedFor('first-run-checklist')).toBe(0);
  });
});
