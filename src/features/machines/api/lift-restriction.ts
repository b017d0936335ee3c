import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RestrictionResponse } from '../../../../shared/schemas/machine-restrictions';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** POST …/machines/:machineId/restriction/lift with an optional note; 409 when it has none. */
export const liftRestriction = (orgId: string, machineId: string, note: string) =>
  apiClient.post<RestrictionResponse>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/restriction/lift`,
    { note },
  );

export function useLiftRestriction(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (note: string) => liftRestriction(orgId, machineId, note),
    onSuccess: () => invalidate(queryClient, changedBy.machineStatus(orgId)),
  });
}
