import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { TaskList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getTasks = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<TaskList>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}/tasks`, {
    signal,
  });

export const tasksQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.tasks.machine(orgId, machineId),
    queryFn: ({ signal }) => getTasks(orgId, machineId, signal),
  });

export const useTasks = (orgId: string, machineId: string) =>
  useQuery(tasksQueryOptions(orgId, machineId));
