import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationCreateInput } from '../../../../shared/schemas/auth';
import { apiClient, segment } from '../../../lib/api-client';
import type { InvitationResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const createInvitation = (orgId: string, input: InvitationCreateInput) =>
  apiClient
    .post<InvitationResponse>(`/organizations/${segment(orgId)}/invitations`, input)
    .then((body) => body.data);

export function useCreateInvitation(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationCreateInput) => createInvitation(orgId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.invitations.list(orgId) }),
  });
}
