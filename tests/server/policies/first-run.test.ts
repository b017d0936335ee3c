// Truth table of server/policies/first-run.ts. Callers: see callers.ts. Every expected cell is
// written by hand from the policy's doc (the first-run checklist is a farm manager's; a dealer's
// advisor never sees it, on a farm or on the dealer), not computed.
import { describe, expect, it } from 'vitest';
import { canUseFirstRunChecklist } from '../../../server/policies/first-run';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE = {
  'first-run checklist, on the farm': [Y, N, N, N, N, N, N, N],
  'first-run checklist, on a dealer': [N, N, N, N, N, N, N, N],
} satisfies Record<string, Row>;

const ORGANIZATIONS = {
  'first-run checklist, on the farm': FARM,
  'first-run checklist, on a dealer': VIEW_DEALER,
};

describe('policies/first-run', () => {
  it.each(cells(TABLE))('first run — %s — %s → %s', (ability, relation, expected) => {
    expect(may(ORGANIZATIONS[ability], relation, canUseFirstRunChecklist)).toBe(expected);
  });
});
