import { hasRole, type OrgAccess } from './access';
import { canLogReading } from './machine';
import type { Machine } from '../models';

/** Adding, renaming, removing a machine's meters and choosing its primary: the farm's managers and technicians. */
export const canManageMeters = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');

/**
 * Recording a counter reset (a bale counter zeroed): whoever may log a reading on the machine,
 * operators included — it is what the counter shows, not a part fitted (a meter replacement stays
 * with managers and technicians).
 */
export const canResetCounter = (access: OrgAccess, machine: Machine) =>
  canLogReading(access, machine);

/** The abilities a meter list carries, so the client hides what the caller may not do. */
export const meterAbilities = (access: OrgAccess, machine: Machine) => ({
  manage: canManageMeters(access),
  logReading: canLogReading(access, machine),
});
