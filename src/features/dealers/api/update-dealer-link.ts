import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DealerAccess } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { FarmDealerLink } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const updateDealerLink = (orgId: string, linkId: string, access: DealerAccess) =>
  apiClient
    .patch<DataEnvelope<FarmDealerLink>>(
      `/organizations/${segment(orgId)}/dealers/${segment(linkId)}`,
      { access },
    )
    .then((body) => body.data);

export function useUpdateDealerLink(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ linkId, access }: { linkId: string; access: DealerAccess }) =>
      updateDealerLink(orgId, linkId, access),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.dealers.farmLinks(orgId) }),
  });
}
