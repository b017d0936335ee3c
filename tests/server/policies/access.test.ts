// Truth tables of server/policies/access.ts: who is a member, which role passes, which dealer
// link grants what, and that a refusal is a 403. Callers: see callers.ts. Every expected cell is
// written by hand from the rules of DESIGN.md (roles; a DealerLink grants `view` or `service`)
// and the policy's doc comments, not computed.
import { describe, expect, it } from 'vitest';
import { AppError } from '../../../server/errors';
import {
  authorize,
  dealerHas,
  hasRole,
  isMember,
  type OrgAccess,
} from '../../../server/policies/access';
import { CALLERS, FARM, N, cells, may, type Relation, type Row, Y } from './callers';

const POLICIES = {
  'hasRole manager': (a: OrgAccess) => hasRole(a, 'manager'),
  'hasRole manager or technician': (a: OrgAccess) => hasRole(a, 'manager', 'technician'),
  'hasRole operator': (a: OrgAccess) => hasRole(a, 'operator'),
  'hasRole advisor': (a: OrgAccess) => hasRole(a, 'advisor'),
  'dealerHas view': (a: OrgAccess) => dealerHas(a, 'view'),
  'dealerHas service': (a: OrgAccess) => dealerHas(a, 'service'),
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const ON_FARM: Record<keyof typeof POLICIES, Row> = {
  'hasRole manager': [Y, N, N, N, N, N, N, N],
  'hasRole manager or technician': [Y, Y, N, N, N, N, N, N],
  'hasRole operator': [N, N, Y, Y, N, N, N, N],
  // A dealer's advisor reaches the farm with the role 'advisor', which no farm policy names.
  'hasRole advisor': [N, N, N, N, Y, Y, N, N],
  'dealerHas view': [N, N, N, N, Y, Y, N, N],
  'dealerHas service': [N, N, N, N, N, Y, N, N],
};

describe('policies/access — on the farm', () => {
  it.each(cells(ON_FARM))('access — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/access — isMember', () => {
  const members: [Relation, string | null][] = [
    ['manager', 'manager'],
    ['technician', 'technician'],
    ['operator (assigned)', 'operator'],
    ['operator (not assigned)', 'operator'],
    ['dealer (view link)', null],
    ['dealer (service link)', null],
    ['dealer (unlinked)', null],
    ['stranger', null],
  ];
  it.each(members)('isMember — %s on the farm — role %s', (relation, role) => {
    const membership = isMember(CALLERS[relation], FARM.id);
    expect(membership?.role ?? null).toBe(role);
    if (role !== null) expect(membership?.organizationId).toBe(FARM.id);
  });
});

describe('policies/access — authorize', () => {
  it('authorize — allowed — returns without throwing', () => {
    expect(authorize(true)).toBeUndefined();
  });

  it('authorize — refused — throws a 403 forbidden AppError with the message given', () => {
    let thrown: unknown;
    try {
      authorize(false, 'Only a manager may');
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(AppError);
    expect(thrown).toMatchObject({ status: 403, code: 'forbidden', message: 'Only a manager may' });
  });

  it('authorize — refused without a message — the default sentence', () => {
    expect(() => authorize(false)).toThrow('Your role does not allow this');
  });
});
