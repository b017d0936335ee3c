import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationAcceptInput } from '../../../../shared/schemas/auth';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { storeSession, type Me } from '../../../lib/auth';

/** Accepts with a name and a new password; the answer signs the person in. */
export const acceptInvitation = ({ token, ...input }: InvitationAcceptInput & { token: string }) =>
  apiClient
    .post<DataEnvelope<Me>>(`/invitations/${segment(token)}/accept`, input)
    .then((body) => body.data);

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { allowUnauthorized: true },
    onSuccess: (me) => storeSession(queryClient, me),
  });
}
