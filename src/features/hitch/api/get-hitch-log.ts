import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HitchLog } from '../../../../shared/schemas/hitch';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { HitchLog, HitchSpan } from '../../../../shared/schemas/hitch';

/** GET …/machines/:machineId/hitch-spans: the machine's spans as implement or tractor. */
export const getHitchLog = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<{ data: HitchLog }>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/hitch-spans`,
    { signal },
  );

export const hitchLogQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.hitch.machine(orgId, machineId),
    queryFn: ({ signal }) => getHitchLog(orgId, machineId, signal),
  });

export const useHitchLog = (orgId: string, machineId: string) =>
  useQuery(hitchLogQueryOptions(orgId, machineId));
