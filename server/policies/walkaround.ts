import type { Machine } from '../models';
import { hasRole, type OrgAccess } from './access';
import { isShop } from './service-record';

/** Every farm role walks round the machines it may see (loadMachine has checked that already). */
export const canDoWalkaround = (access: OrgAccess, _machine: Machine) =>
  hasRole(access, 'manager', 'technician', 'operator');
/** A shop inspection (not before use) may be done on a tagged-out machine: technician or manager. */
export const canInspect = (access: OrgAccess) => isShop(access);
export const canEditChecklists = (access: OrgAccess) => hasRole(access, 'manager');
