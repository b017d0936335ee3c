import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MachineUpdateInput } from '../../../../shared/schemas/machines';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineResponse } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const updateMachine = (orgId: string, machineId: string, input: MachineUpdateInput) =>
  apiClient
    .patch<MachineResponse>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}`,
      input,
    )
    .then((body) => body.data);

/** Edit a machine, or retire it (`{ status: 'sold' }`). */
export function useUpdateMachine(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MachineUpdateInput) => updateMachine(orgId, machineId, input),
    // name, fleet number and status show on the fleet, the due list, Log hours and the pickers
    onSuccess: () => invalidate(queryClient, changedBy.machineUpdated(orgId, machineId)),
  });
}
