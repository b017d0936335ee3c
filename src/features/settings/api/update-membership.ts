import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MembershipUpdateInput } from '../../../../shared/schemas/auth';
import { apiClient, segment } from '../../../lib/api-client';
import { sessionKeys } from '../../../lib/auth';
import { memberKeys } from './keys';
import type { MemberResponse } from './types';

export const updateMembership = (orgId: string, memberId: string, input: MembershipUpdateInput) =>
  apiClient
    .patch<MemberResponse>(`/organizations/${segment(orgId)}/members/${segment(memberId)}`, input)
    .then((body) => body.data);

export function useUpdateMembership(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ memberId, ...input }: MembershipUpdateInput & { memberId: string }) =>
      updateMembership(orgId, memberId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: memberKeys.list(orgId) }),
        // a manager may have changed their own role, which changes their navigation
        queryClient.invalidateQueries({ queryKey: sessionKeys.me() }),
      ]),
  });
}
