import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HitchSpan, HitchSpanCreateInput } from '../../../../shared/schemas/hitch';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** POST …/hitch-spans: hitches the implement now. 400 names the field; 409 when it is on another tractor. */
export const startHitch = (orgId: string, input: Partial<HitchSpanCreateInput>) =>
  apiClient.post<{ data: HitchSpan }>(`/organizations/${segment(orgId)}/hitch-spans`, input);

export function useStartHitch(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<HitchSpanCreateInput>) => startHitch(orgId, input),
    onSuccess: () => invalidate(queryClient, changedBy.hitch(orgId)),
  });
}
