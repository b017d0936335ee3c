import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { reminderKeys } from './keys';

export const revokeCalendarFeed = (orgId: string, feedId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/calendar-feeds/${segment(feedId)}`);

export function useRevokeCalendarFeed(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (feedId: string) => revokeCalendarFeed(orgId, feedId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reminderKeys.feeds(orgId) }),
  });
}
