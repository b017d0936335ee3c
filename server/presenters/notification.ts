import { z } from 'zod';
import type { Notification } from '../models';
import { DIGEST_FREQUENCIES, NOTIFICATION_STATUSES } from '../../shared/schemas/notifications';
import type { EffectivePreference } from '../services/reminders';

export const notificationSummarySchema = z
  .object({
    id: z.string(),
    recipient: z.string(),
    kind: z.string(),
    subject: z.string(),
    status: z.enum(NOTIFICATION_STATUSES),
    attempts: z.number(),
    lastError: z.string().nullable(),
    createdAt: z.string(),
    sentAt: z.string().nullable(),
    nextAttemptAt: z.string().nullable(),
  })
  .openapi('NotificationSummary');

export const notificationSchema = notificationSummarySchema
  .extend({ text: z.string(), html: z.string().nullable() })
  .openapi('Notification');

export function presentNotificationSummary(n: Notification) {
  return {
    id: n.id,
    recipient: n.recipient,
    kind: n.kind,
    subject: n.subject,
    status: n.status,
    attempts: n.attempts,
    lastError: n.lastError,
    createdAt: n.createdAt.toISOString(),
    sentAt: n.sentAt ? n.sentAt.toISOString() : null,
    // only a queued message has a next attempt
    nextAttemptAt: n.status === 'queued' ? n.nextAttemptAt.toISOString() : null,
  };
}

/**
 * Messages whose content is a secret of their recipient: an invitation link sets the password of
 * the invited account, a reset link that of an existing one. Their content is never shown.
 */
const SECRET_KINDS = new Set(['invitation', 'password_reset']);
const SECRET_NOTE =
  'This message carries a single-use link for its recipient only, so its content is not shown here.';
// Each digest's unsubscribe link is its recipient's: shown to a manager it would let them switch
// someone else's digest off.
const UNSUBSCRIBE_LINK = /(\/api\/v1\/unsubscribe\/)[A-Za-z0-9._-]+/g;
const withoutUnsubscribeLinks = (body: string) => body.replace(UNSUBSCRIBE_LINK, '$1…');

export const presentNotification = (n: Notification) => ({
  ...presentNotificationSummary(n),
  text: SECRET_KINDS.has(n.kind) ? SECRET_NOTE : withoutUnsubscribeLinks(n.textBody),
  html: SECRET_KINDS.has(n.kind) || !n.htmlBody ? null : withoutUnsubscribeLinks(n.htmlBody),
});

export const preferenceSchema = z
  .object({
    frequency: z.enum(DIGEST_FREQUENCIES),
    weekday: z.number(),
    machineIds: z.array(z.string()),
    categories: z.array(z.string()),
    isDefault: z.boolean(),
  })
  .openapi('NotificationPreference');

export const presentPreference = (p: EffectivePreference) => ({
  frequency: p.frequency,
  weekday: p.weekday,
  machineIds: p.machineIds,
  categories: p.categories,
  isDefault: p.isDefault,
});
