// Truth tables of server/policies/reminders.ts. Callers: see callers.ts. Every expected cell is
// written by hand from the policy's doc (the sent messages and the digest hour are the manager's;
// everyone on a farm chooses their own digest and may have a personal calendar feed; the farm's
// feed is the manager's; a dealer has none of these on a farm or on its own organization), not
// computed.
import { describe, expect, it } from 'vitest';
import {
  canChooseDigest,
  canHavePersonalFeed,
  canManageFarmFeed,
  canSetDigestHour,
  canViewSentMessages,
} from '../../../server/policies/reminders';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

const POLICIES = {
  'view sent messages': canViewSentMessages,
  'choose own digest': canChooseDigest,
  'set the digest hour': canSetDigestHour,
  'personal calendar feed': canHavePersonalFeed,
  'manage the farm feed': canManageFarmFeed,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const ON_FARM: Record<keyof typeof POLICIES, Row> = {
  'view sent messages': [Y, N, N, N, N, N, N, N],
  'choose own digest': [Y, Y, Y, Y, N, N, N, N],
  'set the digest hour': [Y, N, N, N, N, N, N, N],
  'personal calendar feed': [Y, Y, Y, Y, N, N, N, N],
  'manage the farm feed': [Y, N, N, N, N, N, N, N],
};

// On the view-linked dealer's own organization: its advisor is a member, yet none of these apply.
const NOBODY: Row = [N, N, N, N, N, N, N, N];
const ON_DEALER: Record<keyof typeof POLICIES, Row> = {
  'view sent messages': NOBODY,
  'choose own digest': NOBODY,
  'set the digest hour': NOBODY,
  'personal calendar feed': NOBODY,
  'manage the farm feed': NOBODY,
};

describe('policies/reminders — on the farm', () => {
  it.each(cells(ON_FARM))('reminders — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/reminders — on a dealer', () => {
  it.each(cells(ON_DEALER))('reminders — %s — %s → %s', (ability, relation, expected) => {
    expect(may(VIEW_DEALER, relation, POLICIES[ability])).toBe(expected);
  });
});
