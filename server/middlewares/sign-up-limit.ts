import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { signUpClosed, signUpIsOpen } from '../services/sign-up-gate';
import { throttleKey } from '../services/sign-in-throttle';
import { PostgresStore } from './rate-limit';

// Sign-ups are throttled like sign-ins and resets: per client address and per e-mail as typed
// (known or not, so the limits do not tell accounts apart), in the shared PostgreSQL store.
export const SIGN_UP_WINDOW_MINUTES = 60;
export const SIGN_UP_LIMIT_PER_ADDRESS = 10;
export const SIGN_UP_LIMIT_PER_EMAIL = 3;

const throttled = (what: string) => ({
  error: {
    code: 'throttled',
    message: `Too many sign-ups ${what}. Wait an hour, or use the link in the last e-mail you were sent.`,
  },
});

export const signUpPerAddress = rateLimit({
  windowMs: SIGN_UP_WINDOW_MINUTES * 60_000,
  limit: SIGN_UP_LIMIT_PER_ADDRESS,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new PostgresStore('signup:address:'),
  message: throttled('from this address'),
});

export const signUpPerEmail = rateLimit({
  windowMs: SIGN_UP_WINDOW_MINUTES * 60_000,
  limit: SIGN_UP_LIMIT_PER_EMAIL,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => throttleKey(req.body?.email) || 'none',
  store: new PostgresStore('signup:email:'),
  message: throttled('for this e-mail'),
});

/** With SIGNUP=closed every sign-up gets the same plain refusal, whatever it sent. */
export const refuseWhenSignUpClosed: RequestHandler = (_req, _res, next) => {
  if (!signUpIsOpen()) throw signUpClosed();
  next();
};
