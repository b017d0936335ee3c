import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export const removeMembership = (orgId: string, memberId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/members/${segment(memberId)}`);

export function useRemoveMembership(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (memberId: string) => removeMembership(orgId, memberId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.members.all(orgId) }),
  });
}
