// Truth tables of server/policies/organization.ts. Callers: see callers.ts. Every expected cell
// is written by hand from the policy's doc (its own people read an organization's settings, a
// linked dealer never does; settings and deletion belong to whoever runs it: a farm's manager,
// a dealer's advisor), not computed.
import { describe, expect, it } from 'vitest';
import {
  canDeleteOrganization,
  canUpdateOrganization,
  canViewOrganization,
  managingRole,
} from '../../../server/policies/organization';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

const POLICIES = {
  'view settings': canViewOrganization,
  'update settings': canUpdateOrganization,
  'delete the organization': canDeleteOrganization,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const ON_FARM: Record<keyof typeof POLICIES, Row> = {
  'view settings': [Y, Y, Y, Y, N, N, N, N],
  'update settings': [Y, N, N, N, N, N, N, N],
  'delete the organization': [Y, N, N, N, N, N, N, N],
};

// On the view-linked dealer's own organization, where only its advisor is a member.
const ON_DEALER: Record<keyof typeof POLICIES, Row> = {
  'view settings': [N, N, N, N, Y, N, N, N],
  'update settings': [N, N, N, N, Y, N, N, N],
  'delete the organization': [N, N, N, N, Y, N, N, N],
};

describe('policies/organization — on the farm', () => {
  it.each(cells(ON_FARM))('organization — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/organization — on a dealer', () => {
  it.each(cells(ON_DEALER))('organization — %s — %s → %s', (ability, relation, expected) => {
    expect(may(VIEW_DEALER, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/organization — managingRole', () => {
  it('managingRole — a farm is run by its manager, a dealer by its advisor', () => {
    expect(managingRole('farm')).toBe('manager');
    expect(managingRole('dealer')).toBe('advisor');
  });
});
