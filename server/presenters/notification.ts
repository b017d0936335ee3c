import type { CalendarFeed, Notification } from '../models';
import { MACHINE_CATEGORIES, type MachineCategory } from '../../shared/constants';
import type {
  CalendarFeed as CalendarFeedJson,
  DigestPreference,
  SentMessage,
  SentMessageDetail,
} from '../../shared/schemas/notifications';
import type { EffectivePreference } from '../services/digest-preferences';
import { feedUrl } from '../services/calendar';

export function presentNotificationSummary(n: Notification): SentMessage {
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

export const presentNotification = (n: Notification): SentMessageDetail => ({
  ...presentNotificationSummary(n),
  text: SECRET_KINDS.has(n.kind) ? SECRET_NOTE : withoutUnsubscribeLinks(n.textBody),
  html: SECRET_KINDS.has(n.kind) || !n.htmlBody ? null : withoutUnsubscribeLinks(n.htmlBody),
});

const isCategory = (c: string): c is MachineCategory =>
  (MACHINE_CATEGORIES as readonly string[]).includes(c);

export const presentPreference = (p: EffectivePreference): DigestPreference => ({
  frequency: p.frequency,
  weekday: p.weekday,
  machineIds: p.machineIds,
  categories: p.categories.filter(isCategory),
  isDefault: p.isDefault,
});

export const presentFeed = (feed: CalendarFeed): CalendarFeedJson => ({
  id: feed.id,
  scope: feed.userId ? 'personal' : 'farm',
  url: feedUrl(feed.id),
  createdAt: feed.createdAt.toISOString(),
});
