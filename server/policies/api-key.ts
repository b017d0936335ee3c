import type { OrgAccess } from './context';
import { canUpdateOrganization } from './organization';

/** Machine-data keys are the farm's settings: made, listed and revoked by its manager. */
export const canManageApiKeys = (access: OrgAccess) => canUpdateOrganization(access);
