import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { foreignKeys, machineKeys } from './keys';
import type { MachineRefResponse } from './types';

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
    // the status shows on the machine, the fleet, the due list, the defects and the walkaround picker
    onSuccess: () =>
      Promise.all(
        [machineKeys.all, foreignKeys.due, foreignKeys.defects, foreignKeys.walkaroundMachines].map(
          (queryKey) => queryClient.invalidateQueries({ queryKey }),
        ),
      ),
  });
}
