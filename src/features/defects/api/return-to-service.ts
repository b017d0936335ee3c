import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { MachineRefResponse } from '../../../../shared/schemas/machines';

/**
 * POST …/machines/:machineId/return-to-service with the note of what was checked: its own step,
 * never a side effect of closing defects; 409 while a critical defect is still open.
 */
export const returnToService = (orgId: string, machineId: string, note: string) =>
  apiClient.post<MachineRefResponse>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/return-to-service`,
    { note },
  );

export function useReturnToService(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ machineId, note }: { machineId: string; note: string }) =>
      returnToService(orgId, machineId, note),
    onSuccess: () => invalidate(queryClient, changedBy.defects(orgId)),
  });
}
