import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MachineTaskInput } from '../../../../shared/schemas/schedule';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { TaskResponse } from './types';

export const createTask = (orgId: string, machineId: string, input: MachineTaskInput) =>
  apiClient
    .post<TaskResponse>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/tasks`,
      input,
    )
    .then((body) => body.data);

export function useCreateTask(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MachineTaskInput) => createTask(orgId, machineId, input),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
