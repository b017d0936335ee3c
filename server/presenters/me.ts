import { z } from 'zod';
import type { Membership, Organization, User } from '../models';
import { ORGANIZATION_KINDS, ROLES, UNIT_SYSTEMS } from '../../shared/constants';

export const organizationSummarySchema = z
  .object({
    id: z.string(),
    name: z.string(),
    kind: z.enum(ORGANIZATION_KINDS),
    timeZone: z.string(),
    units: z.enum(UNIT_SYSTEMS),
  })
  .openapi('OrganizationSummary');

export const meSchema = z
  .object({
    user: z.object({ id: z.string(), email: z.string(), name: z.string() }),
    memberships: z.array(
      z.object({ id: z.string(), role: z.enum(ROLES), organization: organizationSummarySchema }),
    ),
  })
  .openapi('Me');

export const presentOrganization = (o: Organization) => ({
  id: o.id,
  name: o.name,
  kind: o.kind,
  timeZone: o.timeZone,
  units: o.units,
});

export const presentUser = (u: User) => ({ id: u.id, email: u.email, name: u.name });

export function presentMe(user: User, memberships: Membership[]) {
  return {
    user: presentUser(user),
    memberships: memberships
      .filter((m) => m.organization)
      .sort((a, b) => a.organization!.name.localeCompare(b.organization!.name))
      .map((m) => ({ id: m.id, role: m.role, organization: presentOrganization(m.organization!) })),
  };
}
