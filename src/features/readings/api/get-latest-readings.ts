import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { readingKeys } from './keys';
import type { LatestReadings } from './types';

export const getLatestReadings = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<LatestReadings>(`/organizations/${segment(orgId)}/readings/latest`, {
      signal,
    })
    .then((body) => body.data);

export const latestReadingsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: readingKeys.latest(orgId),
    queryFn: ({ signal }) => getLatestReadings(orgId, signal),
  });

export const useLatestReadings = (orgId: string, options: { enabled?: boolean } = {}) =>
  useQuery({ ...latestReadingsQueryOptions(orgId), enabled: options.enabled ?? true });
