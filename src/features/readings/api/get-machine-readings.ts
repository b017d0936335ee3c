import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { ReadingHistory } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** Enough for two years of daily readings: the chart and the history share this one call. */
export const READING_HISTORY_LIMIT = 2000;

export const getReadings = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient.get<ReadingHistory>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/readings?limit=${READING_HISTORY_LIMIT}`,
    { signal },
  );

export const machineReadingsQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.readings.machine(orgId, machineId),
    queryFn: ({ signal }) => getReadings(orgId, machineId, signal),
  });

export const useMachineReadings = (orgId: string, machineId: string) =>
  useQuery(machineReadingsQueryOptions(orgId, machineId));
