import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DealerInvitationAcceptInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { FarmDealerLink } from './types';

export const acceptDealerInvitation = (token: string, input: DealerInvitationAcceptInput) =>
  apiClient
    .post<DataEnvelope<FarmDealerLink>>(`/dealer-invitations/${segment(token)}/accept`, input)
    .then((body) => body.data);

export function useAcceptDealerInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DealerInvitationAcceptInput) => acceptDealerInvitation(token, input),
    onSuccess: (_link, input) =>
      queryClient.invalidateQueries({ queryKey: dealerKeys.farmLinks(input.organizationId) }),
  });
}
