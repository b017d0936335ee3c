import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { AuditLog } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getAuditEvents = (orgId: string, dealerId: string | null, signal?: AbortSignal) => {
  const query = new URLSearchParams({ pageSize: '50' });
  if (dealerId) query.set('dealerOrganizationId', dealerId);
  else query.set('via', 'dealer');
  return apiClient.get<AuditLog>(`/organizations/${segment(orgId)}/audit-events?${query}`, {
    signal,
  });
};

export const auditEventsQueryOptions = (orgId: string, dealerId: string | null) =>
  queryOptions({
    queryKey: queryKeys.dealers.activity(orgId, dealerId),
    queryFn: ({ signal }) => getAuditEvents(orgId, dealerId, signal),
  });

/** What dealers did at the farm (all of them, or one), newest first. */
export const useAuditEvents = (orgId: string, dealerId: string | null) =>
  useQuery({ ...auditEventsQueryOptions(orgId, dealerId), placeholderData: keepPreviousData });
