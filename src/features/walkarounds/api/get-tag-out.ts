import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MachineDetail } from '../../../../shared/schemas/machines';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

// The machine's own detail (the same answer and key as its page), read here for its tag-out:
// why and since when.
export const getMachineDetail = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<MachineDetail>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}`, {
    signal,
  });

export const machineDetailQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.machines.detail(orgId, machineId),
    queryFn: ({ signal }) => getMachineDetail(orgId, machineId, signal),
  });

/** Why and since when the machine is tagged out (null fields: not told, or not tagged out). */
export const useTagOut = (orgId: string, machineId: string, enabled = true) =>
  useQuery({
    ...machineDetailQueryOptions(orgId, machineId),
    enabled,
    select: (body) => body.data.tagOut,
  });
