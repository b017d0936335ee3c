// The machine a browser test adds for itself (its own fleet number, listed in demo-fleet.ts), so
// it never disturbs a demo machine another file reads: created through the API as the signed-in
// person, with readings given as [how long ago in ms, meter value], each checked.
import { expect } from 'vitest';
import type { Page } from 'playwright-core';

export interface OwnReading {
  /** how long before now the reading was taken, ms */
  agoMs: number;
  value: number;
}

/** POST …/machines (201) then each reading (201); the new machine's id. */
export async function addOwnMachine(
  page: Page,
  orgId: string,
  machine: { fleetNumber: string; name: string; category: string } & Record<string, unknown>,
  readings: OwnReading[] = [],
): Promise<string> {
  const base = `/api/v1/organizations/${orgId}`;
  const created = await page.request.post(`${base}/machines`, { data: machine });
  expect(created.status(), `${machine.fleetNumber} created`).toBe(201);
  const id = (await created.json()).data.id as string;
  for (const { agoMs, value } of readings) {
    const res = await page.request.post(`${base}/machines/${id}/readings`, {
      data: { value, takenAt: new Date(Date.now() - agoMs).toISOString() },
    });
    expect(res.status(), `${machine.fleetNumber} reading ${value}`).toBe(201);
  }
  return id;
}
