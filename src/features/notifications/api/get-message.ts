import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { SentMessageDetail } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getMessage = (orgId: string, id: string, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<SentMessageDetail>>(
      `/organizations/${segment(orgId)}/notifications/${segment(id)}`,
      { signal },
    )
    .then((body) => body.data);

export const messageQueryOptions = (orgId: string, id: string) =>
  queryOptions({
    queryKey: queryKeys.messages.detail(orgId, id),
    queryFn: ({ signal }) => getMessage(orgId, id, signal),
  });

export const useMessage = (orgId: string, id: string) => useQuery(messageQueryOptions(orgId, id));
