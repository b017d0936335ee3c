import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationLookup, InvitationLookupResponse } from '../../../../shared/schemas/auth';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** What an invitation link shows before it is accepted. */
export type InvitationPreview = InvitationLookup;

export const getInvitation = (token: string, signal?: AbortSignal) =>
  apiClient
    .get<InvitationLookupResponse>(`/invitations/${segment(token)}`, { signal })
    .then((body) => body.data);

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: queryKeys.auth.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    meta: { allowUnauthorized: true },
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
