import type { RequestHandler } from 'express';
import { z } from 'zod';
import { notFound } from '../errors';
import { isMember } from '../policies/access';
import { dealerMayReach } from '../policies/dealer-link';
import { findDealerAccess, recordDealerRead } from '../services/dealer-access';

const uuid = z.uuid();

/** The resource a route path names after the organization: 'machines', 'due', 'service-records'… */
function entityOf(routePath: string, params: Record<string, unknown>) {
  const parts = routePath.split('/').filter((p) => p && !p.startsWith(':'));
  const entityType = parts.slice(1).join('/') || 'organization';
  const named = Object.entries(params).find(([k, v]) => k !== 'orgId' && typeof v === 'string');
  return { entityType, entityId: (named?.[1] as string | undefined) ?? null };
}

/**
 * Resolves :orgId against the caller's memberships, then against the active dealer links of the
 * dealers they advise. Anything else answers 404 so ids cannot be probed. A dealer reaches only
 * the routes its access lists (policies/dealer-link.ts), and each of its reads is written to the
 * farm's audit log here, in one place.
 */
export const resolveOrgAccess: RequestHandler = async (req, _res, next) => {
  const orgId = req.params.orgId;
  if (!req.auth || typeof orgId !== 'string' || !uuid.safeParse(orgId).success)
    throw notFound('Organization');
  const membership = isMember(req.auth, orgId);
  if (membership?.organization) {
    req.access = {
      organization: membership.organization,
      userId: req.auth.user.id,
      role: membership.role,
      via: 'member',
    };
    return next();
  }
  const dealer = await findDealerAccess(req.auth, orgId);
  const routePath: string = req.route?.path ?? '';
  if (!dealer || !dealerMayReach(dealer.dealerAccess, req.method, routePath))
    throw notFound('Organization');
  req.access = dealer;
  if (req.method === 'GET' || req.method === 'HEAD')
    await recordDealerRead(dealer, {
      ...entityOf(routePath, req.params),
      path: req.originalUrl.split('?')[0],
    });
  next();
};
