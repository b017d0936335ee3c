import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LastDoneInput } from '../../../../shared/schemas/schedule';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { TaskResponse } from './types';

export const setLastDone = (orgId: string, taskId: string, input: LastDoneInput) =>
  apiClient
    .put<TaskResponse>(`/organizations/${segment(orgId)}/tasks/${segment(taskId)}/last-done`, input)
    .then((body) => body.data);

export function useSetLastDone(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ taskId, ...input }: LastDoneInput & { taskId: string }) =>
      setLastDone(orgId, taskId, input),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
