import type { NotificationStatusName } from '../../../../shared/schemas/notifications';

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
export interface MessageFilters {
  status?: NotificationStatusName;
  page: number;
}
