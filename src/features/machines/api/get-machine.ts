import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { machineKeys } from './keys';
import type { MachineDetail } from './types';

export const getMachine = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<MachineDetail>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}`, {
    signal,
  });

export const machineQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: machineKeys.detail(orgId, machineId),
    queryFn: ({ signal }) => getMachine(orgId, machineId, signal),
  });

export const useMachine = (orgId: string, machineId: string) =>
  useQuery(machineQueryOptions(orgId, machineId));
