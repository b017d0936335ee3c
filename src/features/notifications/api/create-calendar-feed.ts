import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CalendarFeedScope } from '../../../../shared/schemas/notifications';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { CalendarFeed } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const createCalendarFeed = (orgId: string, scope: CalendarFeedScope) =>
  apiClient
    .post<DataEnvelope<CalendarFeed>>(`/organizations/${segment(orgId)}/calendar-feeds`, { scope })
    .then((body) => body.data);

export function useCreateCalendarFeed(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (scope: CalendarFeedScope) => createCalendarFeed(orgId, scope),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.reminders.feeds(orgId) }),
  });
}
