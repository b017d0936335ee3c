import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { DueFilters, DueList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getDue = (orgId: string, filters: DueFilters, signal?: AbortSignal) => {
  const query = new URLSearchParams({
    horizon: String(filters.horizon),
    page: String(filters.page),
    pageSize: String(filters.pageSize),
  });
  if (filters.category) query.set('category', filters.category);
  if (filters.status) query.set('status', filters.status);
  return apiClient.get<DueList>(`/organizations/${segment(orgId)}/due?${query}`, { signal });
};

export const dueQueryOptions = (orgId: string, filters: DueFilters) =>
  queryOptions({
    queryKey: queryKeys.due.list(orgId, filters),
    queryFn: ({ signal }) => getDue(orgId, filters, signal),
  });

/**
 * The due list for these filters. While a new filter loads, the previous answer stays on screen
 * (marked as updating) so the counts and rows do not flash away. Disabled for dealer
 * organizations, which have no machines of their own.
 */
export const useDue = (orgId: string, filters: DueFilters, options: { enabled?: boolean } = {}) =>
  useQuery({
    ...dueQueryOptions(orgId, filters),
    enabled: options.enabled ?? true,
    placeholderData: keepPreviousData,
  });
