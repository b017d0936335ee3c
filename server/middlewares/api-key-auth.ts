// Machine-data routes authenticate by an organization API key (`Authorization: Bearer hs_…`),
// never by the session cookie: a key reaches these routes only (every other route asks for a
// session and answers 401), and these routes answer only a key. Each key has its own request
// quota, counted in PostgreSQL (rate-limit.ts's store) so every API process shares it.
import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from '../errors';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';
import type { KeyContext } from '../policies/context';
import { authenticateApiKey } from '../services/api-keys';
import { PostgresStore } from './rate-limit';

declare module 'express-serve-static-core' {
  interface Request {
    apiKey?: KeyContext;
  }
}

/** Requests one key may make per minute (a snapshot of a whole fleet is one request). */
export const API_KEY_REQUESTS_PER_MINUTE = 120;

const BEARER = /^Bearer\s+(\S+)\s*$/i;

/** The key of the `Authorization: Bearer` header, or undefined when there is none. */
export const bearerKeyOf = (header: string | undefined) => header?.match(BEARER)?.[1];

/** 401 without a live key, 403 when the key lacks `scope`; the key's context in `req.apiKey`. */
export function requireApiKey(scope: ApiKeyScope): RequestHandler {
  return async (req, _res, next) => {
    const text = bearerKeyOf(req.get('authorization'));
    if (!text)
      throw new AppError(
        401,
        'unauthenticated',
        'Send an organization API key: Authorization: Bearer hs_…',
      );
    const key = await authenticateApiKey(text);
    if (!key)
      throw new AppError(401, 'unauthenticated', 'This API key is not valid or has been revoked');
    if (!key.scopes.includes(scope))
      throw new AppError(403, 'forbidden', `This API key may not do this: it needs ${scope}`);
    req.apiKey = key;
    next();
  };
}

/** Each key's quota per minute: a clear 429 with Retry-After past it. */
export const perKeyLimit = rateLimit({
  windowMs: 60_000,
  limit: API_KEY_REQUESTS_PER_MINUTE,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => req.apiKey!.keyId,
  store: new PostgresStore('apikey:'),
  message: {
    error: {
      code: 'throttled',
      message: `Too many requests with this API key: at most ${API_KEY_REQUESTS_PER_MINUTE} a minute. Wait for the time in Retry-After and send again.`,
    },
  },
});
