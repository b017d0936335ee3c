import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { API_BASE, apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { PartsForecast } from './types';
import { queryKeys } from '../../../lib/query-keys';

const search = (horizon: number, customerId: string | null) => {
  const query = new URLSearchParams({ horizon: String(horizon) });
  if (customerId) query.set('customerId', customerId);
  return query;
};

export const getPartsForecast = (
  orgId: string,
  horizon: number,
  customerId: string | null,
  signal?: AbortSignal,
) =>
  apiClient
    .get<DataEnvelope<PartsForecast>>(
      `/organizations/${segment(orgId)}/parts-forecast?${search(horizon, customerId)}`,
      { signal },
    )
    .then((body) => body.data);

export const partsCsvHref = (orgId: string, horizon: number, customerId: string | null) =>
  `${API_BASE}/organizations/${segment(orgId)}/parts-forecast.csv?${search(horizon, customerId)}`;

export const partsForecastQueryOptions = (
  orgId: string,
  horizon: number,
  customerId: string | null,
) =>
  queryOptions({
    queryKey: queryKeys.dealers.parts(orgId, horizon, customerId),
    queryFn: ({ signal }) => getPartsForecast(orgId, horizon, customerId, signal),
  });

export const usePartsForecast = (orgId: string, horizon: number, customerId: string | null) =>
  useQuery({
    ...partsForecastQueryOptions(orgId, horizon, customerId),
    placeholderData: keepPreviousData,
  });
