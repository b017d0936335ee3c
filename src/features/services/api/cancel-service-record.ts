import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { RecordResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const cancelServiceRecord = (orgId: string, recordId: string) =>
  apiClient.post<RecordResponse>(
    `/organizations/${segment(orgId)}/service-records/${segment(recordId)}/cancel`,
  );

export function useCancelServiceRecord(orgId: string, machineId: string, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelServiceRecord(orgId, recordId),
    onSuccess: async (result) => {
      queryClient.setQueryData(queryKeys.serviceRecords.detail(orgId, recordId), result);
      await invalidate(
        queryClient,
        changedBy.serviceRecord(orgId, machineId, { completed: false }),
      );
    },
  });
}
