import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { TasksResponse } from './types';

export const applyTemplate = (orgId: string, machineId: string, templateId: string) =>
  apiClient
    .post<TasksResponse>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/apply-template`,
      {
        templateId,
      },
    )
    .then((body) => body.data);

/** Adds all of a template's tasks to the machine in one step; the tasks already there stay. */
export function useApplyTemplate(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (templateId: string) => applyTemplate(orgId, machineId, templateId),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
