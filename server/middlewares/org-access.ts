import type { RequestHandler } from 'express';
import { z } from 'zod';
import { notFound } from '../errors';
import { isMember } from '../policies/access';

const uuid = z.uuid();

/** Resolves :orgId against the caller's memberships; anything else answers 404 so ids cannot be probed. */
export const resolveOrgAccess: RequestHandler = (req, _res, next) => {
  const orgId = req.params.orgId;
  if (!req.auth || typeof orgId !== 'string' || !uuid.safeParse(orgId).success)
    throw notFound('Organization');
  const membership = isMember(req.auth, orgId);
  if (!membership?.organization) throw notFound('Organization');
  req.access = {
    organization: membership.organization,
    userId: req.auth.user.id,
    role: membership.role,
    via: 'member',
  };
  next();
};
