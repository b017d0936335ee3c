import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';
import type { DealerOutlook } from '../../../../shared/schemas/shop-outlook';

/** The dealer's next `weeks` weeks across its linked customers, or one (issue 17). */
export const getCustomerOutlook = (
  orgId: string,
  weeks: number,
  customerId: string | null,
  signal?: AbortSignal,
) => {
  const query = new URLSearchParams({ weeks: String(weeks) });
  if (customerId) query.set('customerId', customerId);
  return apiClient
    .get<DataEnvelope<DealerOutlook>>(
      `/organizations/${segment(orgId)}/customer-outlook?${query}`,
      { signal },
    )
    .then((body) => body.data);
};

export const customerOutlookQueryOptions = (
  orgId: string,
  weeks: number,
  customerId: string | null,
) =>
  queryOptions({
    queryKey: queryKeys.dealers.outlook(orgId, weeks, customerId),
    queryFn: ({ signal }) => getCustomerOutlook(orgId, weeks, customerId, signal),
  });

export const useCustomerOutlook = (orgId: string, weeks: number, customerId: string | null) =>
  useQuery({
    ...customerOutlookQueryOptions(orgId, weeks, customerId),
    placeholderData: keepPreviousData,
  });
