import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MessageFilters } from './types';
import type { SentMessageList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const MESSAGES_PAGE_SIZE = 50;

export const getMessages = (orgId: string, filters: MessageFilters, signal?: AbortSignal) => {
  const params = new URLSearchParams({
    page: String(filters.page),
    pageSize: String(MESSAGES_PAGE_SIZE),
  });
  if (filters.status) params.set('status', filters.status);
  return apiClient.get<SentMessageList>(
    `/organizations/${segment(orgId)}/notifications?${params}`,
    { signal },
  );
};

export const messagesQueryOptions = (orgId: string, filters: MessageFilters) =>
  queryOptions({
    queryKey: queryKeys.messages.list(orgId, filters),
    queryFn: ({ signal }) => getMessages(orgId, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useMessages = (
  orgId: string,
  filters: MessageFilters,
  options: { enabled?: boolean } = {},
) => useQuery({ ...messagesQueryOptions(orgId, filters), enabled: options.enabled ?? true });
