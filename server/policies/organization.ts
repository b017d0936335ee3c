import type { OrganizationKind, Role } from '../../shared/constants';
import type { OrgAccess } from './access';

/** The role that runs each kind of organization: a farm's manager, a dealer's advisor. */
export const managingRole = (kind: OrganizationKind): Role =>
  kind === 'farm' ? 'manager' : 'advisor';

/** Its own people read an organization's settings; a linked dealer never does. */
export const canViewOrganization = (access: OrgAccess) => access.via === 'member';

/** Settings and deletion belong to whoever runs the organization. */
export const canUpdateOrganization = (access: OrgAccess) =>
  access.via === 'member' && access.role === managingRole(access.organization.kind);

export const canDeleteOrganization = canUpdateOrganization;
