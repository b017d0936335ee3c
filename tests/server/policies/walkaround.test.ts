// Truth tables of server/policies/walkaround.ts. Callers: see callers.ts. Every expected cell is
// written by hand from DESIGN.md (every farm role walks round the machines it may see; a shop
// inspection is a technician's or a manager's; the manager edits the checklists) and the dealer
// allow-list of policies/dealer-link.ts (walkarounds stay the farm's own), not computed.
import { describe, expect, it } from 'vitest';
import type { Machine } from '../../../server/models';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canDoWalkaround,
  canEditChecklists,
  canInspect,
} from '../../../server/policies/walkaround';
import { FARM, N, Y, cells, may, type Row } from './callers';

const machine = { id: 'machine-1', status: 'in_service' } as Machine;

const POLICIES = {
  'do walkaround': (a: OrgAccess) => canDoWalkaround(a, machine),
  'shop inspection': canInspect,
  'edit checklists': canEditChecklists,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE: Record<keyof typeof POLICIES, Row> = {
  'do walkaround': [Y, Y, Y, Y, N, N, N, N],
  'shop inspection': [Y, Y, N, N, N, N, N, N],
  'edit checklists': [Y, N, N, N, N, N, N, N],
};

describe('policies/walkaround — on the farm', () => {
  it.each(cells(TABLE))('walkaround — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});
