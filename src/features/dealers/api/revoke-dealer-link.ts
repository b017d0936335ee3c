import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { FarmDealerLink } from './types';

export const revokeDealerLink = (orgId: string, linkId: string) =>
  apiClient
    .post<DataEnvelope<FarmDealerLink>>(
      `/organizations/${segment(orgId)}/dealers/${segment(linkId)}/revoke`,
    )
    .then((body) => body.data);

export function useRevokeDealerLink(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) => revokeDealerLink(orgId, linkId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: dealerKeys.farmLinks(orgId) }),
  });
}
