// Sessions live in PostgreSQL: the cookie carries a signed token naming one `sessions` row, and
// every request checks that row (not revoked, not expired) while loading the user and their
// memberships in the same query. Any API copy sees a sign-out or a password reset at once.
import type { Request, Response } from 'express';
import jwt from 'jsonwebtoken';
import { Op, type Transaction } from 'sequelize';
import { env } from '../env';
import { Session } from '../models';
import { readLiveSession, type SessionUser } from './session-load';

export type { SessionUser } from './session-load';

export const SESSION_COOKIE = 'hs_session';

// last_seen_at is written at most this often per session, so reads do not each cost a write.
const TOUCH_EVERY_MS = 5 * 60_000;
// Ended and expired rows are kept a while (who was signed in when), then dropped at sign-in.
const KEEP_ENDED_DAYS = 30;

interface SessionClaims {
  sub: string;
  sid: string;
}

function cookieSecure(req: Request): boolean {
  if (env.COOKIE_SECURE === 'auto') return req.secure;
  return env.COOKIE_SECURE === 'true';
}

const cookieOptions = (req: Request) => ({
  httpOnly: true,
  sameSite: 'lax' as const,
  secure: cookieSecure(req),
  path: '/',
});

/** Opens a session row for the user and sets its signed token as an httpOnly, SameSite=Lax cookie. */
export async function startSession(req: Request, res: Response, userId: string): Promise<void> {
  const maxAgeMs = env.SESSION_TTL_HOURS * 3600_000;
  await Session.destroy({
    where: {
      userId,
      [Op.or]: [
        { expiresAt: { [Op.lt]: new Date(Date.now() - KEEP_ENDED_DAYS * 86_400_000) } },
        { revokedAt: { [Op.lt]: new Date(Date.now() - KEEP_ENDED_DAYS * 86_400_000) } },
      ],
    },
  });
  const session = await Session.create({
    userId,
    userAgent: String(req.get('user-agent') ?? '').slice(0, 500),
    expiresAt: new Date(Date.now() + maxAgeMs),
    revokedAt: null,
  });
  const token = jwt.sign({ sub: userId, sid: session.id } satisfies SessionClaims, env.JWT_SECRET, {
    expiresIn: Math.round(maxAgeMs / 1000),
    issuer: 'hourstone',
  });
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(req), maxAge: maxAgeMs });
}

/** Ends the session of this request's cookie (if any) on the server and clears the cookie. */
export async function endSession(req: Request, res: Response): Promise<void> {
  const claims = readSession(req.cookies?.[SESSION_COOKIE]);
  if (claims) {
    await Session.update(
      { revokedAt: new Date() },
      { where: { id: claims.sessionId, userId: claims.userId, revokedAt: null } },
    );
  }
  res.clearCookie(SESSION_COOKIE, cookieOptions(req));
}

/** Ends every live session of the user but `keepSessionId` (a password change keeps its own). */
export async function endOtherSessions(
  userId: string,
  keepSessionId: string | null,
  transaction?: Transaction,
): Promise<number> {
  const [count] = await Session.update(
    { revokedAt: new Date() },
    {
      where: {
        userId,
        revokedAt: null,
        ...(keepSessionId && { id: { [Op.ne]: keepSessionId } }),
      },
      transaction,
    },
  );
  return count;
}

/** The user and session ids of a validly signed token, or null. */
export function readSession(
  token: string | undefined,
): { userId: string; sessionId: string } | null {
  if (!token) return null;
  try {
    const claims = jwt.verify(token, env.JWT_SECRET, { issuer: 'hourstone' }) as SessionClaims;
    if (typeof claims.sub !== 'string' || typeof claims.sid !== 'string') return null;
    return { userId: claims.sub, sessionId: claims.sid };
  } catch {
    return null;
  }
}

/**
 * The live session of a token with its user and memberships (one query), or null when the
 * token is invalid or its session was ended or has expired.
 */
export async function loadSession(
  token: string | undefined,
): Promise<{ sessionId: string; user: SessionUser } | null> {
  const claims = verifiedClaims(token);
  // A token signed before sessions had ids, or tampered with, names no row.
  if (!claims || !/^[0-9a-f-]{36}$/i.test(claims.sessionId)) return null;
  const session = await readLiveSession(claims.userId, claims.sessionId);
  if (!session) return null;
  if (Date.now() - session.lastSeenAt.getTime() > TOUCH_EVERY_MS) {
    await Session.update({ lastSeenAt: new Date() }, { where: { id: claims.sessionId } });
  }
  return { sessionId: claims.sessionId, user: session.user };
}

// Tokens already verified, with their expiry: checking a signature costs more than the session's
// query, and a browser sends the same token with every request. What a token says never changes,
// so remembering it is safe; whether its session is still live is asked of the database each time.
const VERIFIED_MAX = 5_000;
const verified = new Map<string, { userId: string; sessionId: string; expiresAtMs: number }>();

function verifiedClaims(token: string | undefined) {
  if (!token) return null;
  const known = verified.get(token);
  if (known && known.expiresAtMs > Date.now()) return known;
  const claims = readSession(token);
  if (!claims) return null;
  const { exp } = jwt.decode(token) as { exp?: number };
  if (verified.size >= VERIFIED_MAX) verified.clear();
  verified.set(token, { ...claims, expiresAtMs: exp ? exp * 1000 : 0 });
  return claims;
}
