import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DefectUpdateInput } from '../../../../shared/schemas/defects';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { DefectResponse } from '../../../../shared/schemas/defects';

/** PATCH …/defects/:defectId: assign, start or stop the repair, re-grade (technician, manager). */
export const updateDefect = (orgId: string, defectId: string, input: DefectUpdateInput) =>
  apiClient.patch<DefectResponse>(
    `/organizations/${segment(orgId)}/defects/${segment(defectId)}`,
    input,
  );

export function useUpdateDefect(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ defectId, input }: { defectId: string; input: DefectUpdateInput }) =>
      updateDefect(orgId, defectId, input),
    onSuccess: () => invalidate(queryClient, changedBy.defects(orgId)),
  });
}
