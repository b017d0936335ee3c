// Query keys of sent messages, reminder preferences and calendar feeds, general to specific.
import type { NotificationStatusName } from '../../../../shared/schemas/notifications';

export interface MessageFilters {
  status?: NotificationStatusName;
  page: number;
}

export const messageKeys = {
  all: ['messages'] as const,
  lists: () => [...messageKeys.all, 'list'] as const,
  list: (orgId: string, filters: MessageFilters) =>
    [...messageKeys.lists(), orgId, filters] as const,
  details: () => [...messageKeys.all, 'detail'] as const,
  detail: (orgId: string, id: string) => [...messageKeys.details(), orgId, id] as const,
};

export const reminderKeys = {
  all: ['reminders'] as const,
  preferences: (orgId: string) => [...reminderKeys.all, 'preferences', orgId] as const,
  feeds: (orgId: string) => [...reminderKeys.all, 'feeds', orgId] as const,
};
