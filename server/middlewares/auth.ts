import type { RequestHandler } from 'express';
import type { Membership, User } from '../models';
import { unauthenticated } from '../errors';
import { loadSession, SESSION_COOKIE } from '../infra/session';

export interface AuthContext {
  user: User;
  memberships: Membership[];
  /** the `sessions` row of this request's cookie */
  sessionId: string;
}

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
    access?: import('../policies/access').OrgAccess;
  }
}

/**
 * Loads the live session with its user and memberships in one query on every request, so a
 * sign-out, a password reset, a role change or a removal counts from the next request.
 */
export const requireAuth: RequestHandler = async (req, _res, next) => {
  const session = await loadSession(req.cookies?.[SESSION_COOKIE]);
  if (!session) throw unauthenticated();
  req.auth = {
    user: session.user,
    memberships: session.user.memberships,
    sessionId: session.sessionId,
  };
  next();
};
