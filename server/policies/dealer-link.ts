import type { DealerAccess } from '../../shared/schemas/dealers';
import { hasRole, type OrgAccess } from './access';

/**
 * The farm routes a dealer's advisor may reach through a link, by the access they need. Every
 * other farm route answers 404 to a dealer, exactly as to a stranger, so a route added later is
 * closed to dealers until it is listed here. The route's own policy still decides after this
 * (a listed write refused by role answers 403).
 *
 * - view: machines, their meters, readings, due points, the schedule's tasks and the spec sheet, read only.
 * - service: also the service history (records, attachments, measurements) and recording,
 *   planning, completing and cancelling services. Schedule and spec sheet edits, readings entry and import,
 *   defects, walkarounds, the team, messages and settings stay the farm's own.
 */
const DEALER_ROUTES: readonly { method: string; path: string; access: DealerAccess }[] = [
  { method: 'GET', path: '/organizations/:orgId/machines', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/photo', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/readings', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/meters', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/hitch-spans', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/readings/latest', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/due', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/due', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/tasks', access: 'view' },
  { method: 'GET', path: '/organizations/:orgId/machines/:machineId/spec-sheet', access: 'view' },
  {
    method: 'GET',
    path: '/organizations/:orgId/machines/:machineId/service-records',
    access: 'service',
  },
  {
    method: 'GET',
    path: '/organizations/:orgId/machines/:machineId/service-records/prefill',
    access: 'service',
  },
  {
    method: 'POST',
    path: '/organizations/:orgId/machines/:machineId/service-records',
    access: 'service',
  },
  { method: 'GET', path: '/organizations/:orgId/service-records/:recordId', access: 'service' },
  { method: 'PATCH', path: '/organizations/:orgId/service-records/:recordId', access: 'service' },
  {
    method: 'POST',
    path: '/organizations/:orgId/service-records/:recordId/complete',
    access: 'service',
  },
  {
    method: 'POST',
    path: '/organizations/:orgId/service-records/:recordId/cancel',
    access: 'service',
  },
  {
    method: 'POST',
    path: '/organizations/:orgId/service-records/:recordId/attachments',
    access: 'service',
  },
  {
    method: 'GET',
    path: '/organizations/:orgId/service-records/:recordId/attachments/:attachmentId',
    access: 'service',
  },
  {
    method: 'GET',
    path: '/organizations/:orgId/machines/:machineId/measurements',
    access: 'service',
  },
  {
    method: 'GET',
    path: '/organizations/:orgId/machines/:machineId/measurements/series',
    access: 'service',
  },
  // Reached only to be refused (403, canRestrict): a dealer who tries is told plainly that the
  // farm's people set and lift a restriction, rather than that the machine is not there.
  { method: 'POST', path: '/organizations/:orgId/machines/:machineId/restriction', access: 'view' },
  {
    method: 'POST',
    path: '/organizations/:orgId/machines/:machineId/restriction/lift',
    access: 'view',
  },
];

/** Whether a dealer holding `access` may reach this route (method + Express path pattern). */
export function dealerMayReach(access: DealerAccess, method: string, routePath: string): boolean {
  const m = method === 'HEAD' ? 'GET' : method;
  return DEALER_ROUTES.some(
    (r) => r.method === m && r.path === routePath && (r.access === 'view' || access === 'service'),
  );
}

const isDealerAdvisor = (access: OrgAccess) =>
  access.via === 'member' && access.organization.kind === 'dealer' && hasRole(access, 'advisor');
const isFarmManager = (access: OrgAccess) =>
  access.via === 'member' && access.organization.kind === 'farm' && hasRole(access, 'manager');

/** The dealer's side: its advisors see their customers, the board, parts, reminders, bookings. */
export const canUseDealerBoard = isDealerAdvisor;
export const canInviteCustomers = isDealerAdvisor;
export const canSendReminders = isDealerAdvisor;
export const canProposeBookings = isDealerAdvisor;
/** Bookings show to the dealer's advisors and to the farm's shop (the manager decides). */
export const canListBookings = (access: OrgAccess) =>
  isDealerAdvisor(access) ||
  (access.via === 'member' &&
    access.organization.kind === 'farm' &&
    hasRole(access, 'manager', 'technician'));

/** The farm's side: its managers grant, change and revoke access, and decide bookings. */
export const canManageDealerLinks = isFarmManager;
export const canDecideBookings = isFarmManager;
export const canViewAuditLog = isFarmManager;
