import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineRefResponse } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

/**
 * POST …/machines/:machineId/return-to-service with the note of what was checked; 409 while a
 * critical defect is open or in repair (the message says how many).
 */
export const returnToService = (orgId: string, machineId: string, note: string) =>
  apiClient.post<MachineRefResponse>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/return-to-service`,
    { note },
  );

export function useReturnToService(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (note: string) => returnToService(orgId, machineId, note),
    onSuccess: () => invalidate(queryClient, changedBy.machineStatus(orgId)),
  });
}
