import type { NotificationListQuery } from '../../../../shared/schemas/notifications';
import type { ListFilters } from '../../../lib/list-filters';

// The notification API's answers are the shared schemas' types (shared/schemas/notifications.ts).
export type {
  CalendarFeed,
  CalendarFeeds,
  DigestPreference,
  ReminderPreferences,
  SentMessage,
  SentMessageDetail,
  SentMessageList,
} from '../../../../shared/schemas/notifications';

/** The sent-messages list's filters (the page's URL). */
export type MessageFilters = Pick<ListFilters<NotificationListQuery>, 'page'> &
  Partial<Pick<NotificationListQuery, 'status'>>;
