import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CustomerInvitationInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { Customer } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const inviteCustomer = (orgId: string, input: CustomerInvitationInput) =>
  apiClient
    .post<DataEnvelope<Customer>>(`/organizations/${segment(orgId)}/customer-invitations`, input)
    .then((body) => body.data);

export function useInviteCustomer(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CustomerInvitationInput) => inviteCustomer(orgId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.dealers.customers(orgId) }),
  });
}
