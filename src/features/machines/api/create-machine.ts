import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MachineCreateInput } from '../../../../shared/schemas/machines';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineResponse } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const createMachine = (orgId: string, input: MachineCreateInput) =>
  apiClient
    .post<MachineResponse>(`/organizations/${segment(orgId)}/machines`, input)
    .then((body) => body.data);

export function useCreateMachine(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MachineCreateInput) => createMachine(orgId, input),
    onSuccess: () => invalidate(queryClient, changedBy.machineCreated(orgId)),
  });
}
