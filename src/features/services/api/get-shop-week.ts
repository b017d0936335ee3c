import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { ShopWeek } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The shop's week from `start` (a Monday, yyyy-mm-dd), or the server's current week. */
export const getShopWeek = (orgId: string, start: string | null, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<ShopWeek>>(
      `/organizations/${segment(orgId)}/shop-week${start ? `?start=${encodeURIComponent(start)}` : ''}`,
      { signal },
    )
    .then((body) => body.data);

export const shopWeekQueryOptions = (orgId: string, start: string | null) =>
  queryOptions({
    queryKey: queryKeys.shopWeek.week(orgId, start),
    queryFn: ({ signal }) => getShopWeek(orgId, start, signal),
    placeholderData: keepPreviousData,
  });

export const useShopWeek = (orgId: string, start: string | null) =>
  useQuery(shopWeekQueryOptions(orgId, start));
