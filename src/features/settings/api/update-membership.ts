import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MembershipUpdateInput } from '../../../../shared/schemas/auth';
import { apiClient, segment } from '../../../lib/api-client';

import type { MemberResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';

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
        queryClient.invalidateQueries({ queryKey: queryKeys.members.all(orgId) }),
        // a manager may have changed their own role, which changes their navigation
        queryClient.invalidateQueries({ queryKey: queryKeys.session.me() }),
      ]),
  });
}
