import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HitchSpan } from '../../../../shared/schemas/hitch';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** POST …/hitch-spans/:spanId/end: unhitches now. 409 when it was unhitched already. */
export const endHitch = (orgId: string, spanId: string) =>
  apiClient.post<{ data: HitchSpan }>(
    `/organizations/${segment(orgId)}/hitch-spans/${segment(spanId)}/end`,
    {},
  );

export function useEndHitch(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (spanId: string) => endHitch(orgId, spanId),
    onSuccess: () => invalidate(queryClient, changedBy.hitch(orgId)),
  });
}
