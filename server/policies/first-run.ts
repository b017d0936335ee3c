import { hasRole, type OrgAccess } from './access';

/** The first-run checklist is a farm manager's (a dealer's advisor never sees it). */
export const canUseFirstRunChecklist = (access: OrgAccess) =>
  access.via === 'member' && access.organization.kind === 'farm' && hasRole(access, 'manager');
