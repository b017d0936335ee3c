// Truth table of server/policies/spec-sheet.ts. Callers: see callers.ts. Every expected cell is
// written by hand from the decision in the policy's comment (the farm's managers and technicians
// edit the sheet, as the schedule it fills; a dealer never does, whatever its link — the same
// rule as schedule edits in policies/dealer-link.ts); not computed. Reading is whoever may see the
// machine, which loadMachine decides before any policy (tests/server/spec-sheet.test.ts).
import { describe, expect, it } from 'vitest';
import type { OrgAccess } from '../../../server/policies/access';
import { canEditSpecSheet, specSheetAbilities } from '../../../server/policies/spec-sheet';
import { FARM, N, Y, cells, may, type Row } from './callers';

const POLICIES = {
  'edit spec sheet': canEditSpecSheet,
  'abilities.update': (a: OrgAccess) => specSheetAbilities(a).update,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE: Record<keyof typeof POLICIES, Row> = {
  'edit spec sheet': [Y, Y, N, N, N, N, N, N],
  'abilities.update': [Y, Y, N, N, N, N, N, N],
};

describe('policies/spec-sheet — on the farm', () => {
  it.each(cells(TABLE))('spec sheet — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});
