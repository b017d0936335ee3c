import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { invalidateAfterReadingChange } from './invalidate-readings';

export const deleteReading = (orgId: string, readingId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/readings/${segment(readingId)}`);

export function useDeleteReading(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: string) => deleteReading(orgId, readingId),
    onSuccess: () => invalidateAfterReadingChange(queryClient, orgId, machineId),
  });
}
