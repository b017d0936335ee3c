import type { RequestHandler } from 'express';
import { Membership, Organization, User } from '../models';
import { unauthenticated } from '../errors';
import { readSession, SESSION_COOKIE } from '../services/session';

export interface AuthContext {
  user: User;
  memberships: Membership[];
}

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
    access?: import('../policies/access').OrgAccess;
  }
}

/** Loads the signed-in user and their memberships (one query each request: no server-side session state). */
export const requireAuth: RequestHandler = async (req, _res, next) => {
  const userId = readSession(req.cookies?.[SESSION_COOKIE]);
  if (!userId) throw unauthenticated();
  const user = await User.findByPk(userId, {
    include: [
      {
        model: Membership,
        as: 'memberships',
        include: [{ model: Organization, as: 'organization' }],
      },
    ],
  });
  if (!user) throw unauthenticated();
  const memberships = (user as User & { memberships: Membership[] }).memberships ?? [];
  req.auth = { user, memberships };
  next();
};
