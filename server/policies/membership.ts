import type { Role } from '../../shared/constants';
import { FARM_ROLES, DEALER_ROLES } from '../../shared/constants';
import type { Membership } from '../models';
import { hasRole, type OrgAccess } from './access';

const isManagerOf = (access: OrgAccess) =>
  access.organization.kind === 'farm' ? hasRole(access, 'manager') : hasRole(access, 'advisor');

/** Roles that exist in this kind of organization. */
export const rolesFor = (access: Pick<OrgAccess, 'organization'>): readonly Role[] =>
  access.organization.kind === 'farm' ? FARM_ROLES : DEALER_ROLES;

export const canListMembers = (_access: OrgAccess) => true;
export const canInviteMembers = (access: OrgAccess) => isManagerOf(access);
export const canUpdateMember = (access: OrgAccess, member: Membership) =>
  isManagerOf(access) && member.userId !== access.userId;
export const canRemoveMember = (access: OrgAccess, member: Membership) =>
  isManagerOf(access) && member.userId !== access.userId;
