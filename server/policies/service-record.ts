import type { Machine, ServiceRecord } from '../models';
import { hasRole, type OrgAccess } from './access';

/**
 * The people who do a farm's shop work: its managers and technicians. A dealer holding a `service`
 * link (issue 6) joins here, so every service and defect policy below follows without edits.
 */
export const isShop = (access: OrgAccess) => hasRole(access, 'manager', 'technician');

/** Anyone who may see the machine sees its service history (operators included). */
export const canViewServiceRecords = (_access: OrgAccess, _machine: Machine) => true;
export const canRecordService = (access: OrgAccess, machine: Machine) =>
  isShop(access) && machine.status !== 'sold';
export const canUpdateServiceRecord = (access: OrgAccess, record: ServiceRecord) =>
  isShop(access) && record.status !== 'cancelled';
export const canCompleteServiceRecord = (access: OrgAccess, record: ServiceRecord) =>
  isShop(access) && record.status === 'planned';
export const canCancelServiceRecord = (access: OrgAccess, record: ServiceRecord) =>
  isShop(access) && record.status === 'planned';
export const canAttachToServiceRecord = (access: OrgAccess, record: ServiceRecord) =>
  isShop(access) && record.status !== 'cancelled';
export const canViewShopWeek = (access: OrgAccess) => isShop(access);

export const serviceRecordAbilities = (access: OrgAccess, record: ServiceRecord) => ({
  update: canUpdateServiceRecord(access, record),
  complete: canCompleteServiceRecord(access, record),
  cancel: canCancelServiceRecord(access, record),
  attach: canAttachToServiceRecord(access, record),
});
