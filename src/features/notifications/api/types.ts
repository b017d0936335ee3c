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
