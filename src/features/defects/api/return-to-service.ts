import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { invalidateAfterDefectChange } from './invalidate';
import type { MachineRef } from './types';

/** POST …/machines/:machineId/clear-tag-out; 409 while a critical defect is still open. */
export const clearTagOut = (orgId: string, machineId: string, note: string) =>
  apiClient.post<{ data: MachineRef }>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/clear-tag-out`,
    { note },
  );

export function useClearTagOut(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ machineId, note }: { machineId: string; note: string }) =>
      clearTagOut(orgId, machineId, note),
    onSuccess: () => invalidateAfterDefectChange(queryClient),
  });
}
