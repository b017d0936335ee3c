import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const deleteTask = (orgId: string, taskId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/tasks/${segment(taskId)}`);

export function useDeleteTask(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (taskId: string) => deleteTask(orgId, taskId),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
