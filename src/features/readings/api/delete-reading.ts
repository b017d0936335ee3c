import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const deleteReading = (orgId: string, readingId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/readings/${segment(readingId)}`);

export function useDeleteReading(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: string) => deleteReading(orgId, readingId),
    onSuccess: () => invalidate(queryClient, changedBy.machineReadings(orgId, machineId)),
  });
}
