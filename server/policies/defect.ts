import type { Machine } from '../models';
import { hasRole, type OrgAccess } from './access';
import { canReturnToService } from './machine';

/** Anyone who may see the machine may report a defect on it (operators first of all). */
export const canReportDefect = (access: OrgAccess, machine: Machine) =>
  hasRole(access, 'manager', 'technician', 'operator') && machine.status !== 'sold';
/**
 * Assign, move to in repair, close: the farm's own shop. Not `isShop`: a dealer's `service` link
 * records services but never handles, reads or names a farm's defects (a dealer's role is
 * 'advisor', so no farm role passes for it).
 */
export const canHandleDefects = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');

export const defectAbilities = (access: OrgAccess) => ({
  update: canHandleDefects(access),
  close: canHandleDefects(access),
  returnToService: canReturnToService(access),
});
