import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { taskKeys } from './keys';
import type { TaskList } from './types';

export const getTasks = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<TaskList>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}/tasks`, {
    signal,
  });

export const tasksQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: taskKeys.list(orgId, machineId),
    queryFn: ({ signal }) => getTasks(orgId, machineId, signal),
  });

export const useTasks = (orgId: string, machineId: string) =>
  useQuery(tasksQueryOptions(orgId, machineId));
