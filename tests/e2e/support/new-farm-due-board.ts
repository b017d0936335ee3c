// The new-farm journey's dashboard check, kept apart so the journey reads as one story.
import { expect } from 'vitest';
import type { Page } from 'playwright-core';

/**
 * The dashboard of the farm at 1366 px: the one task is counted as "no forecast" (one reading
 * cannot give a pace of use) and its row shows the due point worked out by hand — last done at
 * 3,900 h + 500 h interval = 4,400 h, against the imported 4,210 h: 190 h left.
 */
export async function expectDueBoard(page: Page) {
  const table = page.getByRole('table', { name: 'Due services' });
  await table.waitFor();
  const counts = page.getByRole('list', { name: 'Task counts' });
  for (const [status, n] of [
    ['Overdue', 0],
    ['Due soon', 0],
    ['History unknown', 0],
    ['OK', 0],
    ['No forecast', 1],
  ] as const) {
    // a card is named by what it shows: its status, then its count
    const name = new RegExp(`^${status}:? ${n}$`);
    expect(await counts.getByRole('button', { name }).count()).toBe(1);
  }
  const rows = table.getByRole('row').filter({ has: page.getByRole('cell') });
  expect(await rows.count()).toBe(1);
  expect(
    (await rows.getByRole('cell').allInnerTexts()).map((t) => t.replace(/\s+/g, ' ').trim()),
  ).toEqual([
    'No forecast',
    'QB-01 Row-crop tractor',
    'Engine oil and filter',
    '4,400 h',
    'Not enough readings',
    '190 h left',
  ]);
}
