import { z } from 'zod';
import { MACHINE_CATEGORIES } from '../constants';
import { uuid, pagingFields } from './common';
import { pageMetaSchema } from './refs';

export const DIGEST_FREQUENCIES = ['daily', 'weekly', 'off'] as const;
export type DigestFrequency = (typeof DIGEST_FREQUENCIES)[number];
export const DIGEST_FREQUENCY_LABELS: Record<DigestFrequency, string> = {
  daily: 'Every day',
  weekly: 'Once a week',
  off: 'Off',
};

/** ISO weekdays: 1 = Monday … 7 = Sunday. */
export const WEEKDAY_LABELS = [
  'Monday',
  'Tuesday',
  'Wednesday',
  'Thursday',
  'Friday',
  'Saturday',
  'Sunday',
] as const;

/** How far ahead the due digest looks at what the forecast brings due (days). */
export const DIGEST_HORIZON_DAYS = 14;

/**
 * The most tasks one digest lists (overdue first, then by the date each falls due); past it the
 * digest says how many more of each kind there are and links to the full due list, so a
 * 2,000-machine farm gets a readable e-mail of a few hundred kB rather than several MB.
 */
export const DIGEST_TASK_CAP = 200;

export const notificationPreferenceSchema = z.object({
  frequency: z.enum(DIGEST_FREQUENCIES, { error: 'Choose every day, once a week or off' }),
  weekday: z
    .number({ error: 'Choose a weekday' })
    .int()
    .min(1, { error: 'Weekday is 1 (Monday) to 7 (Sunday)' })
    .max(7, { error: 'Weekday is 1 (Monday) to 7 (Sunday)' })
    .default(1),
  machineIds: z
    .array(uuid, { error: 'Machines must be a list of ids' })
    .max(1000, { error: 'At most 1,000 machines' })
    .default([]),
  categories: z
    .array(z.enum(MACHINE_CATEGORIES, { error: 'Not a machine category' }), {
      error: 'Categories must be a list',
    })
    .max(MACHINE_CATEGORIES.length, { error: 'Each category once' })
    .default([]),
});
export type NotificationPreferenceInput = z.infer<typeof notificationPreferenceSchema>;

export const reminderSettingsSchema = z
  .object({
    digestHour: z
      .number({ error: 'Choose an hour' })
      .int({ error: 'Use a whole hour' })
      .min(0, { error: 'The hour is 0 to 23' })
      .max(23, { error: 'The hour is 0 to 23' }),
  })
  .strict();
export type ReminderSettingsInput = z.infer<typeof reminderSettingsSchema>;

export const CALENDAR_FEED_SCOPES = ['personal', 'farm'] as const;
export type CalendarFeedScope = (typeof CALENDAR_FEED_SCOPES)[number];

export const calendarFeedCreateSchema = z.object({
  scope: z.enum(CALENDAR_FEED_SCOPES, { error: 'Scope is personal or farm' }),
});
export type CalendarFeedCreateInput = z.infer<typeof calendarFeedCreateSchema>;

export const NOTIFICATION_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
export type NotificationStatusName = (typeof NOTIFICATION_STATUSES)[number];

export const notificationListQuerySchema = z.object({
  status: z
    .enum(NOTIFICATION_STATUSES, { error: 'Status is queued, sending, sent or failed' })
    .optional(),
  ...pagingFields(50, 200),
});
export type NotificationListQuery = z.infer<typeof notificationListQuerySchema>;

/** What the e-mails are, in words, for the "Sent messages" page. */
export const NOTIFICATION_KIND_LABELS: Record<string, string> = {
  due_digest: 'Due digest',
  stale_nudge: 'Log hours reminder',
  overdue: 'Overdue alert',
  invitation: 'Invitation',
  password_reset: 'Password reset',
  tag_out: 'Tag-out notice',
  dealer_reminder: 'Dealer reminder',
  dealer_link_request: 'Dealer access request',
  dealer_link_granted: 'Dealer access granted',
  booking_proposed: 'Booking proposal',
  booking_accepted: 'Booking accepted',
  booking_declined: 'Booking declined',
  booking_cancelled: 'Booking withdrawn',
  sign_up_confirm: 'Sign-up link',
  sign_up_existing: 'Sign-up attempt',
  email_change_confirm: 'E-mail change link',
  email_change_taken: 'E-mail change attempt',
  email_changed: 'E-mail changed',
  organization_deleted: 'Organization deleted',
};

// --- Responses ---------------------------------------------------------------------------------

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
    /** only a queued message has a next attempt */
    nextAttemptAt: z.string().nullable(),
  })
  .meta({ id: 'NotificationSummary' });
export type SentMessage = z.infer<typeof notificationSummarySchema>;

export const notificationSchema = notificationSummarySchema
  .extend({ text: z.string(), html: z.string().nullable() })
  .meta({ id: 'Notification' });
export type SentMessageDetail = z.infer<typeof notificationSchema>;

export const sentMessageListResponseSchema = z.object({
  data: z.array(notificationSummarySchema),
  meta: pageMetaSchema.extend({
    counts: z.record(z.enum(NOTIFICATION_STATUSES), z.number()),
  }),
});
export type SentMessageList = z.infer<typeof sentMessageListResponseSchema>;
export const sentMessageResponseSchema = z.object({ data: notificationSchema });

export const preferenceSchema = z
  .object({
    frequency: z.enum(DIGEST_FREQUENCIES),
    /** ISO weekday of the weekly digest */
    weekday: z.number(),
    machineIds: z.array(z.string()),
    categories: z.array(z.enum(MACHINE_CATEGORIES)),
    /** nothing saved yet: the role's default */
    isDefault: z.boolean(),
  })
  .meta({ id: 'NotificationPreference' });
export type DigestPreference = z.infer<typeof preferenceSchema>;

export const reminderSettingsOutSchema = z.object({ digestHour: z.number(), timeZone: z.string() });

export const reminderPreferencesResponseSchema = z.object({
  data: preferenceSchema,
  meta: reminderSettingsOutSchema.extend({
    machines: z.array(
      z.object({
        id: z.string(),
        fleetNumber: z.string(),
        name: z.string(),
        category: z.enum(MACHINE_CATEGORIES),
      }),
    ),
  }),
  abilities: z.object({ setDigestHour: z.boolean(), manageFarmFeed: z.boolean() }),
});
export type ReminderPreferences = z.infer<typeof reminderPreferencesResponseSchema>;
export const preferenceResponseSchema = z.object({ data: preferenceSchema });
export const reminderSettingsResponseSchema = z.object({ data: reminderSettingsOutSchema });

export const calendarFeedSchema = z
  .object({
    id: z.string(),
    scope: z.enum(CALENDAR_FEED_SCOPES),
    /** the secret address to subscribe to */
    url: z.string(),
    createdAt: z.string(),
  })
  .meta({ id: 'CalendarFeed' });
export type CalendarFeed = z.infer<typeof calendarFeedSchema>;

export const calendarFeedsSchema = z.object({
  personal: calendarFeedSchema.nullable(),
  farm: calendarFeedSchema.nullable(),
});
export type CalendarFeeds = z.infer<typeof calendarFeedsSchema>;
export const calendarFeedsResponseSchema = z.object({ data: calendarFeedsSchema });
export const calendarFeedResponseSchema = z.object({ data: calendarFeedSchema });
