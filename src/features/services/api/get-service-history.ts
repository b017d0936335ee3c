import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { ServiceHistory } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const HISTORY_PAGE_SIZE = 10;

export const getServiceHistory = (
  orgId: string,
  machineId: string,
  filters: { q: string; page: number },
  signal?: AbortSignal,
) => {
  const search = new URLSearchParams({
    page: String(filters.page),
    pageSize: String(HISTORY_PAGE_SIZE),
  });
  if (filters.q.trim()) search.set('q', filters.q.trim());
  return apiClient.get<ServiceHistory>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/service-records?${search}`,
    { signal },
  );
};

export const serviceHistoryQueryOptions = (
  orgId: string,
  machineId: string,
  filters: { q: string; page: number } = { q: '', page: 1 },
) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.list(orgId, machineId, filters),
    queryFn: ({ signal }) => getServiceHistory(orgId, machineId, filters, signal),
    // keep the rows on screen while a search is typed, instead of flashing a skeleton
    placeholderData: keepPreviousData,
  });

export const useServiceHistory = (
  orgId: string,
  machineId: string,
  filters: { q: string; page: number },
) => useQuery(serviceHistoryQueryOptions(orgId, machineId, filters));

/**
 * The completed visits (newest 100), for the service marks on the meter chart: the date done and
 * the lifetime meter at service.
 */
export const serviceEventsQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.events(orgId, machineId),
    queryFn: ({ signal }) =>
      apiClient
        .get<ServiceHistory>(
          `/organizations/${segment(orgId)}/machines/${segment(machineId)}/service-records?status=completed&pageSize=100`,
          { signal },
        )
        .then((body) =>
          body.data.flatMap((r) =>
            r.performedOn && r.meterLifetime !== null
              ? [
                  {
                    recordId: r.id,
                    performedOn: r.performedOn,
                    meter: r.meterLifetime,
                    // the tasks done; none named leaves it empty (the chart says "Service" alone)
                    label: r.tasks.map((t) => t.name).join(', '),
                  },
                ]
              : [],
          ),
        ),
  });

export const useServiceEvents = (orgId: string, machineId: string) =>
  useQuery(serviceEventsQueryOptions(orgId, machineId));

/** Whether the signed-in person may record a service on this machine (the history's abilities). */
export function useCanRecordService(orgId: string, machineId: string): boolean {
  const history = useServiceHistory(orgId, machineId, { q: '', page: 1 });
  return history.data?.abilities.create ?? false;
}
