import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DealerInvitationInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { FarmDealerLink } from './types';

export const grantDealer = (orgId: string, input: DealerInvitationInput) =>
  apiClient
    .post<DataEnvelope<FarmDealerLink>>(`/organizations/${segment(orgId)}/dealers`, input)
    .then((body) => body.data);

export function useGrantDealer(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DealerInvitationInput) => grantDealer(orgId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: dealerKeys.farmLinks(orgId) }),
  });
}
