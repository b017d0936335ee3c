import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { FarmDealerLink } from './types';
import { queryKeys } from '../../../lib/query-keys';

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
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.dealers.farmLinks(orgId) }),
  });
}
