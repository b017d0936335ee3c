import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';
import type { ShopOutlook } from '../../../../shared/schemas/shop-outlook';

/** The farm shop's next `weeks` weeks from this Monday (issue 17). */
export const getShopOutlook = (orgId: string, weeks: number, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<ShopOutlook>>(
      `/organizations/${segment(orgId)}/shop-outlook?weeks=${weeks}`,
      { signal },
    )
    .then((body) => body.data);

export const shopOutlookQueryOptions = (orgId: string, weeks: number) =>
  queryOptions({
    queryKey: queryKeys.shopWeek.outlook(orgId, weeks),
    queryFn: ({ signal }) => getShopOutlook(orgId, weeks, signal),
  });

export const useShopOutlook = (orgId: string, weeks: number) =>
  useQuery(shopOutlookQueryOptions(orgId, weeks));
