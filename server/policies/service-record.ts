import type { Machine, ServiceRecord } from '../models';
import { dealerHas, hasRole, type OrgAccess } from './access';

/**
 * The people who do a farm's service work: its managers and technicians, and a dealer holding a
 * `service` link, so every service policy below follows without edits. Defects and the machine's
 * status are the farm's own (policies/defect.ts, machine.ts), never `isShop`. (Which routes a
 * dealer reaches at all is listed in policies/dealer-link.ts.)
 */
export const isShop = (access: OrgAccess) =>
  hasRole(access, 'manager', 'technician') || dealerHas(access, 'service');

/** Anyone on the farm who may see the machine sees its history; a dealer only with `service`. */
export const canViewServiceRecords = (access: OrgAccess, _machine: Machine) =>
  access.via === 'member' || dealerHas(access, 'service');
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
