import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { Machine } from '../../../../shared/schemas/machines';
import type { MachineOption } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The machines the caller may see, in fleet-number order (200 is the server's page limit). */
export const getMachineOptions = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<{ data: Machine[] }>(
      `/organizations/${segment(orgId)}/machines?sort=fleetNumber&order=asc&page=1&pageSize=200`,
      { signal },
    )
    .then((body) =>
      body.data.map(({ id, fleetNumber, name, status }): MachineOption => ({
        id,
        fleetNumber,
        name,
        status,
      })),
    );

export const machineOptionsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.defects.machineOptions(orgId),
    queryFn: ({ signal }) => getMachineOptions(orgId, signal),
  });

export const useMachineOptions = (orgId: string) => useQuery(machineOptionsQueryOptions(orgId));
