import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MachineUpdateInput } from '../../../../shared/schemas/machines';
import { apiClient, segment } from '../../../lib/api-client';
import { foreignKeys, machineKeys } from './keys';
import type { MachineResponse } from './types';

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
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: machineKeys.detail(orgId, machineId) }),
        queryClient.invalidateQueries({ queryKey: [...machineKeys.lists(), orgId] }),
        // name, fleet number and status show on the due list
        queryClient.invalidateQueries({ queryKey: foreignKeys.due }),
      ]),
  });
}
