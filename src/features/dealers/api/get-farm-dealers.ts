import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { FarmDealerLinks } from '../../../../shared/schemas/dealer-responses';

export const getFarmDealers = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<FarmDealerLinks>(`/organizations/${segment(orgId)}/dealers`, { signal });

export const farmDealersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: dealerKeys.farmLinks(orgId),
    queryFn: ({ signal }) => getFarmDealers(orgId, signal),
  });

export const useFarmDealers = (orgId: string) => useQuery(farmDealersQueryOptions(orgId));
