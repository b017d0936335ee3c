import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { invalidateAfterScheduleChange } from './invalidate-schedule';

export const deleteTask = (orgId: string, taskId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/tasks/${segment(taskId)}`);

export function useDeleteTask(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (taskId: string) => deleteTask(orgId, taskId),
    onSuccess: () => invalidateAfterScheduleChange(queryClient, orgId, machineId),
  });
}
