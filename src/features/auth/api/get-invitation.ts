import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OrganizationKind, Role } from '../../../../shared/constants';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { authKeys } from './keys';

/** What an invitation link shows before it is accepted. */
export interface InvitationPreview {
  email: string;
  name: string;
  role: Role;
  organization: { id: string; name: string; kind: OrganizationKind };
}

export const getInvitation = (token: string, signal?: AbortSignal) =>
  apiClient
    .get<DataEnvelope<InvitationPreview>>(`/invitations/${segment(token)}`, { signal })
    .then((body) => body.data);

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    meta: { allowUnauthorized: true },
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
