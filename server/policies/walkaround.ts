import type { Machine } from '../models';
import { hasRole, type OrgAccess } from './access';

/** Every farm role walks round the machines it may see (loadMachine has checked that already). */
export const canDoWalkaround = (access: OrgAccess, _machine: Machine) =>
  hasRole(access, 'manager', 'technician', 'operator');
/**
 * A shop inspection (not before use) may be done on a tagged-out machine: the farm's technician
 * or manager. Not `isShop`: walkarounds are the farm's own, whatever a dealer's link.
 */
export const canInspect = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');
export const canEditChecklists = (access: OrgAccess) => hasRole(access, 'manager');
