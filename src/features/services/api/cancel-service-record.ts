import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { invalidateAfterService } from './invalidate-after-service';
import { serviceKeys } from './keys';
import type { RecordResponse } from './types';

export const cancelServiceRecord = (orgId: string, recordId: string) =>
  apiClient.post<RecordResponse>(
    `/organizations/${segment(orgId)}/service-records/${segment(recordId)}/cancel`,
  );

export function useCancelServiceRecord(orgId: string, machineId: string, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelServiceRecord(orgId, recordId),
    onSuccess: async (result) => {
      queryClient.setQueryData(serviceKeys.detail(orgId, recordId), result);
      await invalidateAfterService(queryClient, orgId, machineId, { completed: false });
    },
  });
}
