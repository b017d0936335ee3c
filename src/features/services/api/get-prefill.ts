import { queryOptions } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { Prefill } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The parts, fluids and estimated labour the given tasks call for (summed by the server). */
export const getPrefill = (
  orgId: string,
  machineId: string,
  taskIds: readonly string[],
  signal?: AbortSignal,
) =>
  apiClient
    .get<DataEnvelope<Prefill>>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/service-records/prefill?taskIds=${taskIds.map(segment).join(',')}`,
      { signal },
    )
    .then((body) => body.data);

export const prefillQueryOptions = (orgId: string, machineId: string, taskIds: readonly string[]) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.prefill(orgId, machineId, [...taskIds].sort()),
    queryFn: ({ signal }) => getPrefill(orgId, machineId, taskIds, signal),
    staleTime: 5 * 60_000,
  });
