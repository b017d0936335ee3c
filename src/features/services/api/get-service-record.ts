import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { RecordResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getServiceRecord = (orgId: string, recordId: string, signal?: AbortSignal) =>
  apiClient.get<RecordResponse>(
    `/organizations/${segment(orgId)}/service-records/${segment(recordId)}`,
    { signal },
  );

export const serviceRecordQueryOptions = (orgId: string, recordId: string) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.detail(orgId, recordId),
    queryFn: ({ signal }) => getServiceRecord(orgId, recordId, signal),
  });

export const useServiceRecord = (orgId: string, recordId: string) =>
  useQuery({ ...serviceRecordQueryOptions(orgId, recordId), enabled: Boolean(recordId) });
