import { hasRole, type OrgAccess } from './access';

const onFarm = (access: OrgAccess) =>
  access.organization.kind === 'farm' && hasRole(access, 'manager', 'technician', 'operator');

/** The outbox of the organization ("Sent messages") is for its managers. */
export const canViewSentMessages = (access: OrgAccess) => hasRole(access, 'manager');
/** Everyone on a farm chooses their own due digest. */
export const canChooseDigest = onFarm;
export const canSetDigestHour = (access: OrgAccess) => onFarm(access) && hasRole(access, 'manager');
/** Everyone on a farm may have a personal calendar feed of their machines. */
export const canHavePersonalFeed = onFarm;
export const canManageFarmFeed = (access: OrgAccess) =>
  onFarm(access) && hasRole(access, 'manager');
