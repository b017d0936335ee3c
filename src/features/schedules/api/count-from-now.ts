import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { TaskResponse, TasksResponse } from './types';

/** "Start counting from now" for one task whose last service is not known. */
export const countTaskFromNow = (orgId: string, taskId: string) =>
  apiClient
    .post<TaskResponse>(`/organizations/${segment(orgId)}/tasks/${segment(taskId)}/count-from-now`)
    .then((body) => body.data);

/** The same for every task of the machine still waiting for its history. */
export const countMachineFromNow = (orgId: string, machineId: string) =>
  apiClient
    .post<TasksResponse>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/count-from-now`,
    )
    .then((body) => body.data);

/** `taskId` null: every task of the machine whose history is unknown. */
export function useCountFromNow(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (taskId: string | null) =>
      taskId
        ? countTaskFromNow(orgId, taskId).then((t) => [t])
        : countMachineFromNow(orgId, machineId),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
