import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DailyCareBoard } from '../../../../shared/schemas/daily-care';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const getDailyCare = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<DailyCareBoard>(`/organizations/${segment(orgId)}/daily-care`, { signal });

export const dailyCareQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.due.dailyCare(orgId),
    queryFn: ({ signal }) => getDailyCare(orgId, signal),
  });

/** The farm's daily care per machine (grease rounds and daily items signed off in walkarounds). */
export const useDailyCare = (orgId: string) => useQuery(dailyCareQueryOptions(orgId));
