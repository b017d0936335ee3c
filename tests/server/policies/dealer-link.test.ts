// Truth tables of server/policies/dealer-link.ts. Callers: see callers.ts. Every expected cell is
// written by hand from DESIGN.md (a farm grants a dealer `view` or `service`; its manager grants,
// changes and revokes; the dealer's advisors run the board, reminders and bookings) and the
// allow-list's doc comment (view: machines, readings, due points and tasks, read only; service:
// also the service history and recording services; everything else answers 404 to a dealer),
// not computed.
import { describe, expect, it } from 'vitest';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canDecideBookings,
  canInviteCustomers,
  canListBookings,
  canManageDealerLinks,
  canProposeBookings,
  canSendReminders,
  canUseDealerBoard,
  canViewAuditLog,
  dealerMayReach,
} from '../../../server/policies/dealer-link';
import { FARM, N, VIEW_DEALER, Y, cells, may, type Row } from './callers';

const POLICIES: Record<string, (access: OrgAccess) => boolean> = {
  'use the dealer board': canUseDealerBoard,
  'invite customers': canInviteCustomers,
  'send reminders': canSendReminders,
  'propose bookings': canProposeBookings,
  'list bookings': canListBookings,
  'manage dealer links': canManageDealerLinks,
  'decide bookings': canDecideBookings,
  'view the audit log': canViewAuditLog,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const NOBODY: Row = [N, N, N, N, N, N, N, N];
const ON_FARM = {
  // The dealer's side is done on the dealer's own organization, never through a link.
  'use the dealer board': NOBODY,
  'invite customers': NOBODY,
  'send reminders': NOBODY,
  'propose bookings': NOBODY,
  'list bookings': [Y, Y, N, N, N, N, N, N],
  'manage dealer links': [Y, N, N, N, N, N, N, N],
  'decide bookings': [Y, N, N, N, N, N, N, N],
  'view the audit log': [Y, N, N, N, N, N, N, N],
} satisfies Record<keyof typeof POLICIES, Row>;

// On the view-linked dealer's own organization, where only its advisor is a member.
const ADVISOR: Row = [N, N, N, N, Y, N, N, N];
const ON_DEALER = {
  'use the dealer board': ADVISOR,
  'invite customers': ADVISOR,
  'send reminders': ADVISOR,
  'propose bookings': ADVISOR,
  'list bookings': ADVISOR,
  'manage dealer links': NOBODY,
  'decide bookings': NOBODY,
  'view the audit log': NOBODY,
} satisfies Record<keyof typeof POLICIES, Row>;

describe('policies/dealer-link — on the farm', () => {
  it.each(cells(ON_FARM))('dealer link — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/dealer-link — on the dealer', () => {
  it.each(cells(ON_DEALER))('dealer link — %s — %s → %s', (ability, relation, expected) => {
    expect(may(VIEW_DEALER, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/dealer-link — dealerMayReach (the allow-list), by link access', () => {
  const o = '/organizations/:orgId';
  // [method, route path, reachable with a view link, reachable with a service link]
  const routes: [string, string, boolean, boolean][] = [
    ['GET', `${o}/machines`, Y, Y],
    ['GET', `${o}/machines/:machineId`, Y, Y],
    ['GET', `${o}/machines/:machineId/photo`, Y, Y],
    ['GET', `${o}/machines/:machineId/readings`, Y, Y],
    ['GET', `${o}/readings/latest`, Y, Y],
    ['GET', `${o}/due`, Y, Y],
    ['GET', `${o}/machines/:machineId/due`, Y, Y],
    ['GET', `${o}/machines/:machineId/tasks`, Y, Y],
    // HEAD is answered as GET.
    ['HEAD', `${o}/machines`, Y, Y],
    ['GET', `${o}/machines/:machineId/service-records`, N, Y],
    ['GET', `${o}/machines/:machineId/service-records/prefill`, N, Y],
    ['POST', `${o}/machines/:machineId/service-records`, N, Y],
    ['GET', `${o}/service-records/:recordId`, N, Y],
    ['PATCH', `${o}/service-records/:recordId`, N, Y],
    ['POST', `${o}/service-records/:recordId/complete`, N, Y],
    ['POST', `${o}/service-records/:recordId/cancel`, N, Y],
    ['POST', `${o}/service-records/:recordId/attachments`, N, Y],
    ['GET', `${o}/service-records/:recordId/attachments/:attachmentId`, N, Y],
    ['GET', `${o}/machines/:machineId/measurements`, N, Y],
    ['GET', `${o}/machines/:machineId/measurements/series`, N, Y],
    // reached only to be refused by role (403 with words), never to change anything
    ['POST', `${o}/machines/:machineId/restriction`, Y, Y],
    ['POST', `${o}/machines/:machineId/restriction/lift`, Y, Y],
    // The farm's own: schedule edits, readings entry, defects, walkarounds, team, settings.
    ['PATCH', `${o}/machines/:machineId`, N, N],
    ['POST', `${o}/machines`, N, N],
    ['POST', `${o}/machines/:machineId/readings`, N, N],
    ['POST', `${o}/machines/:machineId/tasks`, N, N],
    ['GET', `${o}/defects`, N, N],
    ['GET', `${o}/machines/:machineId/walkarounds`, N, N],
    ['GET', `${o}/members`, N, N],
    ['GET', o, N, N],
    ['DELETE', `${o}/service-records/:recordId`, N, N],
  ];
  it.each(routes)('dealerMayReach — %s %s — view %s, service %s', (method, path, view, service) => {
    expect(dealerMayReach('view', method, path)).toBe(view);
    expect(dealerMayReach('service', method, path)).toBe(service);
  });
});
