import type { Role } from '../../shared/constants';
import type { DealerAccess } from '../../shared/schemas/dealers';
import type { AuthContext, OrgAccess } from './context';
import { forbidden } from '../errors';

export type { DealerAccessContext, MemberAccess, OrgAccess } from './context';

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
