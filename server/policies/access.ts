import type { Role } from '../../shared/constants';
import type { DealerAccess } from '../../shared/schemas/dealers';
import type { Organization } from '../models';
import type { AuthContext } from '../middlewares/auth';
import { forbidden } from '../errors';

/** How the caller reaches an organization: as a member with a role. */
export interface MemberAccess {
  organization: Organization;
  userId: string;
  role: Role;
  via: 'member';
}

/**
 * A dealer's service advisor reaching a farm through an active DealerLink: the organization is
 * the farm, the role is 'advisor', and what they may do follows the link's access.
 */
export interface DealerAccessContext {
  organization: Organization;
  userId: string;
  role: 'advisor';
  via: 'dealer';
  dealerAccess: DealerAccess;
  dealerOrganizationId: string;
  dealerLinkId: string;
}

export type OrgAccess = MemberAccess | DealerAccessContext;

export const isMember = (auth: AuthContext, organizationId: string) =>
  auth.memberships.find((m) => m.organizationId === organizationId) ?? null;

/** Farm roles are held by members only: a dealer's advisor never passes as a farm role. */
export const hasRole = (access: OrgAccess, ...roles: Role[]) => roles.includes(access.role);

/** The caller reaches this farm through a dealer link granting at least this access. */
export const dealerHas = (access: OrgAccess, wanted: DealerAccess) =>
  access.via === 'dealer' && (wanted === 'view' || access.dealerAccess === 'service');

/** Throws 403 unless the predicate holds; every refusal by role goes through here. */
export function authorize(allowed: boolean, message?: string): void {
  if (!allowed) throw forbidden(message);
}
