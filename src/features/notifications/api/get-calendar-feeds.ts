import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { CalendarFeeds } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getCalendarFeeds = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<CalendarFeeds>>(`/organizations/${segment(orgId)}/calendar-feeds`, { signal })
    .then((body) => body.data);

export const calendarFeedsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.reminders.feeds(orgId),
    queryFn: ({ signal }) => getCalendarFeeds(orgId, signal),
  });

export const useCalendarFeeds = (orgId: string) => useQuery(calendarFeedsQueryOptions(orgId));
