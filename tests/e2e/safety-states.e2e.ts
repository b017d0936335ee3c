import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  collectPageErrors,
  launchBrowser,
  screenshot,
  signIn,
  type TestBrowser,
} from './support/browser';
import { SAFETY_STATES_FLEET } from './support/demo-fleet';

// Safety states in the browser: a technician closes the critical defect that tagged a machine out
// and is told plainly that the machine stays tagged out; returning it to service is its own step
// with a note of what was checked, offered where the defect was closed and on the machine page.
// The machine is one no other browser test writes to (support/demo-fleet.ts); each test starts
// and ends with it in service, so the tests pass in any order and alone.
const DESKTOP = { width: 1280, height: 800 };
const FLEET = SAFETY_STATES_FLEET;
const NOTE_LABEL = 'What was checked before returning it to service';

interface MachineRow {
  id: string;
  fleetNumber: string;
  name: string;
  status: string;
}

async function api<T>(page: Page, path: string): Promise<T> {
  const res = await page.request.get(`/api/v1${path}`);
  expect(res.status(), path).toBe(200);
  return (await res.json()) as T;
}

/** Reports a critical defect from the defects page, as the technician would; the machine is tagged out. */
async function reportCritical(page: Page, machine: MachineRow, title: string) {
  await page.getByRole('button', { name: 'Report a defect' }).click();
  const form = page.getByRole('region', { name: 'Report a defect' });
  await form.getByLabel('Machine').selectOption({ label: `${FLEET} · ${machine.name}` });
  await form.getByLabel('Severity').selectOption({ label: 'Critical — do not use' });
  await form.getByLabel('What is wrong').fill(title);
  await form.getByRole('button', { name: 'Report defect' }).click();
  await form.getByText(`${FLEET} is tagged out`).waitFor();
  await page.getByRole('button', { name: 'Hide the report form' }).click();
}

/** Closes the defect with this title from its card on the defects page. */
async function closeDefect(page: Page, title: string, note: string) {
  const card = page.getByRole('article', { name: title });
  await card.getByRole('button', { name: 'Close', exact: true }).click();
  const form = page.getByRole('form', { name: `Close ${title}` });
  // before closing: the form says that closing does not release the machine
  await form.getByText(`${FLEET} stays tagged out`).waitFor();
  expect(await form.innerText()).toMatch(/does not release the machine/);
  await form.getByLabel('What was done').fill(note);
  await form.getByRole('button', { name: 'Close defect' }).click();
}

describe('safety states — closing a defect and returning the machine to service (browser)', () => {
  let browser: TestBrowser;
  let org: string;
  let machine: MachineRow;

  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage(DESKTOP);
    await signIn(page, 'dev@larkspur.example', 'hourstone-demo');
    const me = await api<{
      data: { memberships: { organization: { id: string; name: string } }[] };
    }>(page, '/me');
    org = me.data.memberships.find((m) => m.organization.name === 'Larkspur Flats Farm')!
      .organization.id;
    const machines = await api<{ data: MachineRow[] }>(
      page,
      `/organizations/${org}/machines?q=${FLEET}`,
    );
    machine = machines.data.find((m) => m.fleetNumber === FLEET)!;
    await page.close();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('defects page — closing the last critical defect leaves the machine tagged out; the step is offered there, needs a note, and returns it to service', async () => {
    expect(machine?.status).toBe('in_service');
    const page = await browser.newPage(DESKTOP);
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/defects?machineId=${machine.id}`);
    await page.getByRole('heading', { name: 'Defects', exact: true }).waitFor();
    const title = `Coupling pin cracked (browser test ${Date.now()})`;
    await reportCritical(page, machine, title);
    await closeDefect(page, title, 'New coupling pin and clip fitted');

    const after = page.getByRole('region', { name: `${FLEET} stays tagged out` });
    await after.waitFor();
    expect(await after.innerText()).toMatch(
      new RegExp(`${FLEET} stays tagged out until a technician or manager returns it to service`),
    );
    expect(await after.innerText()).toContain(`No critical defect is open on ${FLEET} now.`);
    expect(
      (await api<{ data: MachineRow }>(page, `/organizations/${org}/machines/${machine.id}`)).data
        .status,
    ).toBe('tagged_out');
    await screenshot(page, 'safety-defect-closed-still-tagged-out');

    // the note is required: nothing is sent without it
    const step = after.getByRole('form', { name: `Return ${FLEET} to service` });
    await step.getByRole('button', { name: `Return ${FLEET} to service` }).click();
    await step.getByText('Say what was checked before returning it to service').waitFor();
    await step.getByLabel(NOTE_LABEL).fill('Coupling and safety chains checked; lights tested');
    await step.getByRole('button', { name: `Return ${FLEET} to service` }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `${FLEET} is back in service` })
      .waitFor();
    expect(
      (await api<{ data: MachineRow }>(page, `/organizations/${org}/machines/${machine.id}`)).data
        .status,
    ).toBe('in_service');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('machine page — shows the tag-out, why and what is still open, and returns the machine to service with a note once the defect is closed', async () => {
    const page = await browser.newPage(DESKTOP);
    const errors = collectPageErrors(page);
    await page.goto(`/o/${org}/defects?machineId=${machine.id}`);
    await page.getByRole('heading', { name: 'Defects', exact: true }).waitFor();
    const title = `Brake line chafed (browser test ${Date.now()})`;
    await reportCritical(page, machine, title);

    await page.goto(`/o/${org}/machines/${machine.id}`);
    const panel = page.getByRole('region', { name: `${FLEET} is tagged out` });
    await panel.waitFor();
    const text = await panel.innerText();
    expect(text).toContain('Tagged out — do not use');
    expect(text).toContain(`Why: Critical defect reported: ${title}`);
    expect(text).toMatch(/1 critical defect is still open/);
    expect(await panel.getByRole('button', { name: 'Return to service…' }).count()).toBe(0);

    await page.goto(`/o/${org}/defects?machineId=${machine.id}`);
    await closeDefect(page, title, 'Brake line replaced and bled');
    await page.getByRole('region', { name: `${FLEET} stays tagged out` }).waitFor();

    await page.goto(`/o/${org}/machines/${machine.id}`);
    await panel.getByText('No critical defect is open.').waitFor();
    await panel.getByRole('button', { name: 'Return to service…' }).click();
    await panel.getByLabel(NOTE_LABEL).fill('Brakes tested on the yard slope, no leaks');
    await screenshot(page, 'safety-machine-page-return-to-service');
    await panel.getByRole('button', { name: `Return ${FLEET} to service` }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `${FLEET} is back in service` })
      .waitFor();
    expect(errors).toEqual([]);
    await page.close();
  });
});
