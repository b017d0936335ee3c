import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DealerInvitationInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { FarmDealerLink } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const grantDealer = (orgId: string, input: DealerInvitationInput) =>
  apiClient
    .post<DataEnvelope<FarmDealerLink>>(`/organizations/${segment(orgId)}/dealers`, input)
    .then((body) => body.data);

export function useGrantDealer(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DealerInvitationInput) => grantDealer(orgId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.dealers.farmLinks(orgId) }),
  });
}
