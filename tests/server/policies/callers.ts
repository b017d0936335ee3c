// Plain-object callers for the policy truth tables: who reaches the farm, and how. No database:
// users, memberships, organizations and links are built by hand, and the access each caller gets
// follows the rules of middlewares/org-access.ts (a membership first, through the real
// `isMember`; else an active dealer link of a dealer the caller advises; else nothing, which the
// middleware answers with 404 before any policy runs).
import type { Membership, Organization } from '../../../server/models';
import type { AuthContext } from '../../../server/policies/context';
import { isMember, type OrgAccess } from '../../../server/policies/access';
import type { Role } from '../../../shared/constants';
import type { DealerAccess } from '../../../shared/schemas/dealers';

const org = (id: string, kind: 'farm' | 'dealer') => ({ id, kind }) as Organization;

export const FARM = org('00000000-0000-4000-8000-00000000f001', 'farm');
export const OTHER_FARM = org('00000000-0000-4000-8000-00000000f002', 'farm');
export const VIEW_DEALER = org('00000000-0000-4000-8000-00000000d001', 'dealer');
export const SERVICE_DEALER = org('00000000-0000-4000-8000-00000000d002', 'dealer');
export const UNLINKED_DEALER = org('00000000-0000-4000-8000-00000000d003', 'dealer');

/** The farm's dealer links: one per dealer; the third was revoked, so it no longer counts. */
const LINKS: { id: string; dealer: Organization; access: DealerAccess; status: string }[] = [
  { id: 'link-view', dealer: VIEW_DEALER, access: 'view', status: 'active' },
  { id: 'link-service', dealer: SERVICE_DEALER, access: 'service', status: 'active' },
  { id: 'link-revoked', dealer: UNLINKED_DEALER, access: 'service', status: 'revoked' },
];

function caller(userId: string, memberships: [Organization, Role][]): AuthContext {
  return {
    user: { id: userId } as AuthContext['user'],
    memberships: memberships.map(
      ([organization, role]) =>
        ({ organizationId: organization.id, userId, role, organization }) as Membership,
    ),
    sessionId: `session-${userId}`,
  };
}

/** User ids of the two operators: the machine of the tables is assigned to the first. */
export const ASSIGNED_OPERATOR = 'user-operator-assigned';
export const OTHER_OPERATOR = 'user-operator-other';

/**
 * The columns of every truth table: the farm's own people by role (operators assigned to the
 * machine or not), the advisors of a dealer linked for `view` and for `service`, the advisor of
 * a dealer whose link was revoked, and a stranger (the manager of another farm).
 */
export const CALLERS = {
  manager: caller('user-manager', [[FARM, 'manager']]),
  technician: caller('user-technician', [[FARM, 'technician']]),
  'operator (assigned)': caller(ASSIGNED_OPERATOR, [[FARM, 'operator']]),
  'operator (not assigned)': caller(OTHER_OPERATOR, [[FARM, 'operator']]),
  'dealer (view link)': caller('user-advisor-view', [[VIEW_DEALER, 'advisor']]),
  'dealer (service link)': caller('user-advisor-service', [[SERVICE_DEALER, 'advisor']]),
  'dealer (unlinked)': caller('user-advisor-unlinked', [[UNLINKED_DEALER, 'advisor']]),
  stranger: caller('user-stranger', [[OTHER_FARM, 'manager']]),
} as const;

export type Relation = keyof typeof CALLERS;
export const RELATIONS = Object.keys(CALLERS) as Relation[];

/** The access a caller gets on an organization, or null when it answers 404 to them. */
export function accessOn(organization: Organization, auth: AuthContext): OrgAccess | null {
  const membership = isMember(auth, organization.id);
  if (membership?.organization) {
    return {
      organization: membership.organization,
      userId: auth.user.id,
      role: membership.role,
      via: 'member',
    };
  }
  const advised = auth.memberships
    .filter((m) => m.role === 'advisor' && m.organization?.kind === 'dealer')
    .map((m) => m.organizationId);
  const link = LINKS.find(
    (l) => l.status === 'active' && advised.includes(l.dealer.id) && organization.id === FARM.id,
  );
  if (!link) return null;
  return {
    organization,
    userId: auth.user.id,
    role: 'advisor',
    via: 'dealer',
    dealerAccess: link.access,
    dealerOrganizationId: link.dealer.id,
    dealerLinkId: link.id,
  };
}

/** One row of a truth table: the expected answer for each relation, in RELATIONS order. */
export type Row = readonly [boolean, boolean, boolean, boolean, boolean, boolean, boolean, boolean];

/**
 * Every cell of a truth table as one it.each case: [ability, relation, expected]. A caller
 * without access is refused before the policy (404), so its cell is `false` whatever the
 * policy would say; the cell still fails if `isMember` or the link lookup let them in.
 */
export function cells<A extends string>(table: Record<A, Row>): Array<[A, Relation, boolean]> {
  return (Object.keys(table) as A[]).flatMap((ability) =>
    RELATIONS.map((relation, i): [A, Relation, boolean] => [ability, relation, table[ability][i]]),
  );
}

/** Whether a caller may, on an organization: no access at all means no. */
export function may(
  organization: Organization,
  relation: Relation,
  policy: (access: OrgAccess) => boolean,
): boolean {
  const access = accessOn(organization, CALLERS[relation]);
  return access !== null && policy(access);
}

export const Y = true;
export const N = false;
