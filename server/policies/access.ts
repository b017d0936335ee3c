import type { Role } from '../../shared/constants';
import type { Organization } from '../models';
import type { AuthContext } from '../middlewares/auth';
import { forbidden } from '../errors';

/** How the caller reaches an organization: as a member with a role (dealer links come later). */
export interface OrgAccess {
  organization: Organization;
  userId: string;
  role: Role;
  via: 'member';
}

export const isMember = (auth: AuthContext, organizationId: string) =>
  auth.memberships.find((m) => m.organizationId === organizationId) ?? null;

export const hasRole = (access: OrgAccess, ...roles: Role[]) => roles.includes(access.role);

/** Throws 403 unless the predicate holds; every refusal by role goes through here. */
export function authorize(allowed: boolean, message?: string): void {
  if (!allowed) throw forbidden(message);
}
