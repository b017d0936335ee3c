import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { DefectList } from '../../../../shared/schemas/defects';
import type { ActiveDefect } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The machine's open and in-repair defects, which a visit may close. */
export const getActiveDefects = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient
    .get<DefectList>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/defects?status=active&pageSize=100`,
      { signal },
    )
    .then((body) =>
      body.data.map((d): ActiveDefect => ({
        id: d.id,
        title: d.title,
        severity: d.severity,
        status: d.status,
      })),
    );

export const activeDefectsQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.activeDefects(orgId, machineId),
    queryFn: ({ signal }) => getActiveDefects(orgId, machineId, signal),
  });

/** `enabled` false: not asked at all (defects are the farm's own, never a dealer's). */
export const useActiveDefects = (orgId: string, machineId: string, enabled = true) =>
  useQuery({ ...activeDefectsQueryOptions(orgId, machineId), enabled });
