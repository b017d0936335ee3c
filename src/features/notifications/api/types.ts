import type {
  CalendarFeedScope,
  DigestFrequency,
  NotificationStatusName,
} from '../../../../shared/schemas/notifications';
import type { MachineCategory } from '../../../../shared/constants';

export interface SentMessage {
  id: string;
  recipient: string;
  kind: string;
  subject: string;
  status: NotificationStatusName;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
  nextAttemptAt: string | null;
}

export interface SentMessageDetail extends SentMessage {
  text: string;
  html: string | null;
}

export interface SentMessageList {
  data: SentMessage[];
  meta: {
    total: number;
    page: number;
    pageSize: number;
    counts: Record<NotificationStatusName, number>;
  };
}

export interface DigestPreference {
  frequency: DigestFrequency;
  weekday: number;
  machineIds: string[];
  categories: MachineCategory[];
  isDefault: boolean;
}

export interface ReminderPreferences {
  data: DigestPreference;
  meta: {
    digestHour: number;
    timeZone: string;
    machines: { id: string; fleetNumber: string; name: string; category: MachineCategory }[];
  };
  abilities: { setDigestHour: boolean; manageFarmFeed: boolean };
}

export interface CalendarFeed {
  id: string;
  scope: CalendarFeedScope;
  url: string;
  createdAt: string;
}

export interface CalendarFeeds {
  personal: CalendarFeed | null;
  farm: CalendarFeed | null;
}
