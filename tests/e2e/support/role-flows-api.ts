// Reading the demo through the API from a signed-in page, for the role-flows browser test.
import { expect } from 'vitest';
import type { Page } from 'playwright-core';

export interface Member {
  role: string;
  user: { id: string; name: string; email: string };
}

export const apiGet = (page: Page, path: string) =>
  page.request.get(`/api/v1${path}`).then(async (response) => {
    expect(response.status(), path).toBe(200);
    return response.json();
  });

export async function farmId(page: Page): Promise<string> {
  const me = await apiGet(page, '/me');
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
  ).organization.id;
}
