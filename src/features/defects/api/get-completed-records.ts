import { useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { ServiceHistory } from '../../../../shared/schemas/service-record-responses';
import type { CompletedRecord } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The machine's latest completed service records, one of which may have fixed the defect. */
export const getCompletedRecords = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient
    .get<ServiceHistory>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/service-records?status=completed&page=1&pageSize=20`,
      { signal },
    )
    .then((body) =>
      body.data.map(({ id, performedOn, meterValue, tasks, notes }): CompletedRecord => ({
        id,
        performedOn,
        meterValue,
        tasks,
        notes,
      })),
    );

export const useCompletedRecords = (orgId: string, machineId: string) =>
  useQuery({
    queryKey: queryKeys.defects.completedRecords(orgId, machineId),
    queryFn: ({ signal }) => getCompletedRecords(orgId, machineId, signal),
  });
