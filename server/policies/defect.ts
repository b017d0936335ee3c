import type { Machine } from '../models';
import { hasRole, type OrgAccess } from './access';
import { isShop } from './service-record';

/** Anyone who may see the machine may report a defect on it (operators first of all). */
export const canReportDefect = (access: OrgAccess, machine: Machine) =>
  hasRole(access, 'manager', 'technician', 'operator') && machine.status !== 'sold';
/** Assign, move to in repair, close, clear a tag-out: the shop. */
export const canHandleDefects = (access: OrgAccess) => isShop(access);
export const canClearTagOut = (access: OrgAccess) => isShop(access);

export const defectAbilities = (access: OrgAccess) => ({
  update: canHandleDefects(access),
  close: canHandleDefects(access),
  clearTagOut: canClearTagOut(access),
});
