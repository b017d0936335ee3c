import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { LatestReadings } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getLatestReadings = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<LatestReadings>(`/organizations/${segment(orgId)}/readings/latest`, {
      signal,
    })
    .then((body) => body.data);

export const latestReadingsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.readings.latest(orgId),
    queryFn: ({ signal }) => getLatestReadings(orgId, signal),
  });

export const useLatestReadings = (orgId: string, options: { enabled?: boolean } = {}) =>
  useQuery({ ...latestReadingsQueryOptions(orgId), enabled: options.enabled ?? true });
