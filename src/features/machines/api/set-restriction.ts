import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RestrictionResponse } from '../../../../shared/schemas/machine-restrictions';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

/**
 * POST …/machines/:machineId/restriction with the reason (3–300 characters): restricts the
 * machine, or changes the reason. 400 names the field; 403 for a role that may not; 409 when sold.
 */
export const setRestriction = (orgId: string, machineId: string, reason: string) =>
  apiClient.post<RestrictionResponse>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/restriction`,
    { reason },
  );

export function useSetRestriction(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => setRestriction(orgId, machineId, reason),
    onSuccess: () => invalidate(queryClient, changedBy.machineStatus(orgId)),
  });
}
