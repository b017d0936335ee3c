import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DealerInvitationAcceptInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { FarmDealerLink } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const acceptDealerInvitation = (token: string, input: DealerInvitationAcceptInput) =>
  apiClient
    .post<DataEnvelope<FarmDealerLink>>(`/dealer-invitations/${segment(token)}/accept`, input)
    .then((body) => body.data);

export function useAcceptDealerInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DealerInvitationAcceptInput) => acceptDealerInvitation(token, input),
    onSuccess: (_link, input) =>
      queryClient.invalidateQueries({
        queryKey: queryKeys.dealers.farmLinks(input.organizationId),
      }),
  });
}
