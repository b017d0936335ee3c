import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DefectCloseInput } from '../../../../shared/schemas/defects';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { ClosedDefect } from './types';

/**
 * POST …/defects/:defectId/close with a note or a completed service record of the machine. The
 * machine's status does not change (a tagged-out machine stays tagged out).
 */
export const closeDefect = (orgId: string, defectId: string, input: DefectCloseInput) =>
  apiClient.post<ClosedDefect>(
    `/organizations/${segment(orgId)}/defects/${segment(defectId)}/close`,
    input,
  );

export function useCloseDefect(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ defectId, input }: { defectId: string; input: DefectCloseInput }) =>
      closeDefect(orgId, defectId, input),
    onSuccess: () => invalidate(queryClient, changedBy.defects(orgId)),
  });
}
