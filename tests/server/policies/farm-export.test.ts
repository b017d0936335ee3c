// Truth table of server/policies/farm-export.ts. Callers: see callers.ts. Every expected cell is
// written by hand from the policy's doc (the farm's data is the farm's: its manager downloads all
// of it; nobody else, no dealer), not computed.
import { describe, expect, it } from 'vitest';
import { canExportFarmData } from '../../../server/policies/farm-export';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE = {
  'export the farm, on the farm': [Y, N, N, N, N, N, N, N],
  // A dealer's own advisor on the dealer's organization: not a farm, nothing to export.
  'export, on a dealer': [N, N, N, N, N, N, N, N],
} satisfies Record<string, Row>;

const ORGANIZATIONS = { 'export the farm, on the farm': FARM, 'export, on a dealer': VIEW_DEALER };

describe('policies/farm-export', () => {
  it.each(cells(TABLE))('farm export — %s — %s → %s', (ability, relation, expected) => {
    expect(may(ORGANIZATIONS[ability], relation, canExportFarmData)).toBe(expected);
  });
});
