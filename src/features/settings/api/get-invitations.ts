import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { invitationKeys } from './keys';
import type { InvitationListResponse } from './types';

export const getInvitations = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<InvitationListResponse>(`/organizations/${segment(orgId)}/invitations`, {
      signal,
    })
    .then((body) => body.data);

export const invitationsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: invitationKeys.list(orgId),
    queryFn: ({ signal }) => getInvitations(orgId, signal),
  });

export const useInvitations = (orgId: string, options: { enabled?: boolean } = {}) =>
  useQuery({ ...invitationsQueryOptions(orgId), enabled: options.enabled ?? true });
