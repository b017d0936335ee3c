// Truth tables of server/policies/membership.ts. Callers: see callers.ts. Every expected cell is
// written by hand from DESIGN.md (a farm's manager, a dealer's advisor runs its team; nobody
// changes or removes their own membership; a farm has manager, technician and operator, a dealer
// advisors) and the dealer allow-list (the team is the farm's own: the members route is not on
// it, so listing is open to anyone the route lets in), not computed.
import { describe, expect, it } from 'vitest';
import type { Membership } from '../../../server/models';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canInviteMembers,
  canListMembers,
  canRemoveMember,
  canUpdateMember,
  rolesFor,
} from '../../../server/policies/membership';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

const someoneElse = { userId: 'user-someone-else' } as Membership;
const own = (a: OrgAccess) => ({ userId: a.userId }) as Membership;

const POLICIES = {
  'list members': canListMembers,
  'invite members': canInviteMembers,
  "change someone else's role": (a: OrgAccess) => canUpdateMember(a, someoneElse),
  'change own role': (a: OrgAccess) => canUpdateMember(a, own(a)),
  'remove someone else': (a: OrgAccess) => canRemoveMember(a, someoneElse),
  'remove oneself': (a: OrgAccess) => canRemoveMember(a, own(a)),
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const ON_FARM: Record<keyof typeof POLICIES, Row> = {
  // Open to every access; a dealer never reaches the route (not on its allow-list).
  'list members': [Y, Y, Y, Y, Y, Y, N, N],
  'invite members': [Y, N, N, N, N, N, N, N],
  "change someone else's role": [Y, N, N, N, N, N, N, N],
  'change own role': [N, N, N, N, N, N, N, N],
  'remove someone else': [Y, N, N, N, N, N, N, N],
  'remove oneself': [N, N, N, N, N, N, N, N],
};

// On the view-linked dealer's own organization, where only its advisor is a member.
const ON_DEALER: Record<keyof typeof POLICIES, Row> = {
  'list members': [N, N, N, N, Y, N, N, N],
  'invite members': [N, N, N, N, Y, N, N, N],
  "change someone else's role": [N, N, N, N, Y, N, N, N],
  'change own role': [N, N, N, N, N, N, N, N],
  'remove someone else': [N, N, N, N, Y, N, N, N],
  'remove oneself': [N, N, N, N, N, N, N, N],
};

describe('policies/membership — on the farm', () => {
  it.each(cells(ON_FARM))('membership — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/membership — on a dealer', () => {
  it.each(cells(ON_DEALER))('membership — %s — %s → %s', (ability, relation, expected) => {
    expect(may(VIEW_DEALER, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/membership — rolesFor', () => {
  it('rolesFor — a farm — manager, technician, operator', () => {
    expect(rolesFor({ organization: FARM })).toEqual(['manager', 'technician', 'operator']);
  });

  it('rolesFor — a dealer — advisor only', () => {
    expect(rolesFor({ organization: VIEW_DEALER })).toEqual(['advisor']);
  });
});
