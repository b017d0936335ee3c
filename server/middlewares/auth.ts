import type { RequestHandler } from 'express';
import { unauthenticated } from '../errors';
import { loadSession, SESSION_COOKIE } from '../infra/session';
import type { AuthContext, OrgAccess } from '../policies/context';

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
    access?: OrgAccess;
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
