import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { Customer, Customers } from '../../../../shared/schemas/dealer-responses';
import { queryKeys } from '../../../lib/query-keys';

export const getCustomers = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<Customers>(`/organizations/${segment(orgId)}/customers`, { signal });

export const customersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.dealers.customers(orgId),
    queryFn: ({ signal }) => getCustomers(orgId, signal),
  });

export const useCustomers = (orgId: string) => useQuery(customersQueryOptions(orgId));

/** A linked customer farm as the advisor's pages of its machines need it: access, clock, money. */
export type CustomerFarm = NonNullable<Customer['customer']> & {
  access: NonNullable<Customer['access']>;
} & NonNullable<Customer['farmSettings']>;

/** The active link to this farm among the dealer's customers: null once revoked or never linked. */
export function useCustomerFarm(dealerId: string, farmId: string, enabled = true) {
  return useQuery({
    ...customersQueryOptions(dealerId),
    enabled,
    select: (body): CustomerFarm | null => {
      const link = body.data.find((c) => c.status === 'active' && c.customer?.id === farmId);
      if (!link?.customer || !link.access || !link.farmSettings) return null;
      return { ...link.customer, access: link.access, ...link.farmSettings };
    },
  });
}
