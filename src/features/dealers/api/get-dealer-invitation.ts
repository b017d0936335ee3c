import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { DealerInvitation } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getDealerInvitation = (token: string, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<DealerInvitation>>(`/dealer-invitations/${segment(token)}`, { signal })
    .then((body) => body.data);

export const dealerInvitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: queryKeys.dealerInvitations.detail(token),
    queryFn: ({ signal }) => getDealerInvitation(token, signal),
    retry: false,
  });

export const useDealerInvitation = (token: string) => useQuery(dealerInvitationQueryOptions(token));
