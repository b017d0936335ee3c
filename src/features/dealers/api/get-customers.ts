import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { Customers } from '../../../../shared/schemas/dealer-responses';
import { queryKeys } from '../../../lib/query-keys';

export const getCustomers = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<Customers>(`/organizations/${segment(orgId)}/customers`, { signal });

export const customersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.dealers.customers(orgId),
    queryFn: ({ signal }) => getCustomers(orgId, signal),
  });

export const useCustomers = (orgId: string) => useQuery(customersQueryOptions(orgId));
