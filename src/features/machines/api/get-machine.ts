import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineDetail } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getMachine = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<MachineDetail>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}`, {
    signal,
  });

export const machineQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.machines.detail(orgId, machineId),
    queryFn: ({ signal }) => getMachine(orgId, machineId, signal),
  });

export const useMachine = (orgId: string, machineId: string) =>
  useQuery(machineQueryOptions(orgId, machineId));
