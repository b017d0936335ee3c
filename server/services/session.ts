import type { Request, Response } from 'express';
import jwt from 'jsonwebtoken';
import { env } from '../env';

export const SESSION_COOKIE = 'hs_session';

interface SessionClaims {
  sub: string;
}

function cookieSecure(req: Request): boolean {
  if (env.COOKIE_SECURE === 'auto') return req.secure;
  return env.COOKIE_SECURE === 'true';
}

/** Signs a session token for the user and sets it as an httpOnly, SameSite=Lax cookie. */
export function startSession(req: Request, res: Response, userId: string): void {
  const maxAgeMs = env.SESSION_TTL_HOURS * 3600_000;
  const token = jwt.sign({ sub: userId } satisfies SessionClaims, env.JWT_SECRET, {
    expiresIn: Math.round(maxAgeMs / 1000),
    issuer: 'hourstone',
  });
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: cookieSecure(req),
    maxAge: maxAgeMs,
    path: '/',
  });
}

export function endSession(req: Request, res: Response): void {
  res.clearCookie(SESSION_COOKIE, {
    httpOnly: true,
    sameSite: 'lax',
    secure: cookieSecure(req),
    path: '/',
  });
}

/** The user id of a valid session token, or null. */
export function readSession(token: string | undefined): string | null {
  if (!token) return null;
  try {
    const claims = jwt.verify(token, env.JWT_SECRET, { issuer: 'hourstone' }) as SessionClaims;
    return typeof claims.sub === 'string' ? claims.sub : null;
  } catch {
    return null;
  }
}
