import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { FarmDealerLinks } from '../../../../shared/schemas/dealer-responses';
import { queryKeys } from '../../../lib/query-keys';

export const getFarmDealers = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<FarmDealerLinks>(`/organizations/${segment(orgId)}/dealers`, { signal });

export const farmDealersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.dealers.farmLinks(orgId),
    queryFn: ({ signal }) => getFarmDealers(orgId, signal),
  });

export const useFarmDealers = (orgId: string) => useQuery(farmDealersQueryOptions(orgId));
