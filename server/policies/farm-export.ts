import { hasRole, type OrgAccess } from './access';

/** The farm's data is the farm's: its manager may download all of it; nobody else, no dealer. */
export const canExportFarmData = (access: OrgAccess) =>
  access.via === 'member' && access.organization.kind === 'farm' && hasRole(access, 'manager');
