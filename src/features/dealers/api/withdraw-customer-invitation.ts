import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const withdrawCustomerInvitation = (orgId: string, linkId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/customer-invitations/${segment(linkId)}`);

export function useWithdrawCustomerInvitation(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) => withdrawCustomerInvitation(orgId, linkId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.dealers.customers(orgId) }),
  });
}
