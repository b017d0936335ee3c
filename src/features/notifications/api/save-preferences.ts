import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotificationPreferenceInput } from '../../../../shared/schemas/notifications';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { DigestPreference } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const savePreferences = (orgId: string, input: NotificationPreferenceInput) =>
  apiClient
    .put<DataEnvelope<DigestPreference>>(
      `/organizations/${segment(orgId)}/notification-preferences`,
      input,
    )
    .then((body) => body.data);

export function useSavePreferences(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NotificationPreferenceInput) => savePreferences(orgId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.reminders.preferences(orgId) }),
  });
}
