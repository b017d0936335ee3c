import { Router } from 'express';
import { messagesRouter } from './messages.router';
import { preferencesRouter } from './preferences.router';
import { unsubscribeRouter } from './unsubscribe.router';

/** Sent messages (the outbox), digest preferences and the one-click unsubscribe. */
export function notificationsRouter(): Router {
  const router = Router();
  router.use(messagesRouter());
  router.use(preferencesRouter());
  router.use(unsubscribeRouter());
  return router;
}
