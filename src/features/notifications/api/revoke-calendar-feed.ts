import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const revokeCalendarFeed = (orgId: string, feedId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/calendar-feeds/${segment(feedId)}`);

export function useRevokeCalendarFeed(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (feedId: string) => revokeCalendarFeed(orgId, feedId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.reminders.feeds(orgId) }),
  });
}
