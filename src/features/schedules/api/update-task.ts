import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TaskInput } from '../../../../shared/schemas/schedule';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { TaskResponse } from './types';

export const updateTask = (orgId: string, taskId: string, input: Partial<TaskInput>) =>
  apiClient
    .patch<TaskResponse>(`/organizations/${segment(orgId)}/tasks/${segment(taskId)}`, input)
    .then((body) => body.data);

export function useUpdateTask(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ taskId, ...input }: Partial<TaskInput> & { taskId: string }) =>
      updateTask(orgId, taskId, input),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
