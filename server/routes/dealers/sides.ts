import { z } from 'zod';
import { notFound } from '../../errors';
import type { OrgAccess } from '../../policies/access';

export const orgParams = z.object({ orgId: z.uuid() });

/** Dealer-side pages exist only for dealer organizations: a farm's id answers 404. */
export function requireDealerOrg(access: OrgAccess | undefined): OrgAccess {
  if (!access || access.via !== 'member' || access.organization.kind !== 'dealer')
    throw notFound('Page');
  return access;
}

/** Farm-side dealer pages exist only for farms reached as a member. */
export function requireFarmOrg(access: OrgAccess | undefined): OrgAccess {
  if (!access || access.via !== 'member' || access.organization.kind !== 'farm')
    throw notFound('Page');
  return access;
}
