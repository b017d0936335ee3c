import type { Membership, Organization, User } from '../models';
import type { Me, OrganizationSummary } from '../../shared/schemas/auth';

export const presentOrganization = (o: Organization): OrganizationSummary => ({
  id: o.id,
  name: o.name,
  kind: o.kind,
  timeZone: o.timeZone,
  units: o.units,
  currency: o.currency,
});

export const presentUser = (u: User): Me['user'] => ({ id: u.id, email: u.email, name: u.name });

export function presentMe(user: User, memberships: Membership[]): Me {
  return {
    user: presentUser(user),
    memberships: memberships
      .filter((m) => m.organization)
      .sort((a, b) => a.organization!.name.localeCompare(b.organization!.name))
      .map((m) => ({ id: m.id, role: m.role, organization: presentOrganization(m.organization!) })),
  };
}
