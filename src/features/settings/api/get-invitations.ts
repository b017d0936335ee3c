import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { InvitationListResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getInvitations = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<InvitationListResponse>(`/organizations/${segment(orgId)}/invitations`, {
      signal,
    })
    .then((body) => body.data);

export const invitationsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.invitations.list(orgId),
    queryFn: ({ signal }) => getInvitations(orgId, signal),
  });

export const useInvitations = (orgId: string, options: { enabled?: boolean } = {}) =>
  useQuery({ ...invitationsQueryOptions(orgId), enabled: options.enabled ?? true });
