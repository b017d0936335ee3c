// Who the caller is, as the middlewares resolve it and the policies read it. Types only, so the
// auth middleware and the policies both import this without importing each other.
import type { Role } from '../../shared/constants';
import type { DealerAccess } from '../../shared/schemas/dealers';
import type { Membership, Organization, User } from '../models';

/** The signed-in person of a request (middlewares/auth.ts). */
export interface AuthContext {
  user: User;
  memberships: Membership[];
  /** the `sessions` row of this request's cookie */
  sessionId: string;
}

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

/**
 * A machine-data request authenticated by an organization API key (middlewares/api-key-auth.ts):
 * the key's organization and what the key may do, never a person's session.
 */
export interface KeyContext {
  organization: Organization;
  keyId: string;
  /** the key's shown prefix (hs_<prefix>_…) */
  keyPrefix: string;
  keyName: string;
  scopes: readonly string[];
  /** who made the key: its readings are entered in their name (null once the account is gone) */
  createdBy: string | null;
}
