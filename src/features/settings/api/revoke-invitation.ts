import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const revokeInvitation = (orgId: string, invitationId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/invitations/${segment(invitationId)}`);

export function useRevokeInvitation(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation(orgId, invitationId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.invitations.list(orgId) }),
  });
}
