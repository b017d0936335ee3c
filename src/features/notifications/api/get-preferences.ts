import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { ReminderPreferences } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getPreferences = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<ReminderPreferences>(`/organizations/${segment(orgId)}/notification-preferences`, {
    signal,
  });

export const preferencesQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.reminders.preferences(orgId),
    queryFn: ({ signal }) => getPreferences(orgId, signal),
  });

export const usePreferences = (orgId: string) => useQuery(preferencesQueryOptions(orgId));
