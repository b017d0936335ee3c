import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReminderSettingsInput } from '../../../../shared/schemas/notifications';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const updateDigestHour = (orgId: string, input: ReminderSettingsInput) =>
  apiClient
    .patch<DataEnvelope<{ digestHour: number; timeZone: string }>>(
      `/organizations/${segment(orgId)}/reminder-settings`,
      input,
    )
    .then((body) => body.data);

export function useUpdateDigestHour(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReminderSettingsInput) => updateDigestHour(orgId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.reminders.preferences(orgId) }),
  });
}
