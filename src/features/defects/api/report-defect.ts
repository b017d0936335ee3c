import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DefectCreateInput } from '../../../../shared/schemas/defects';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { ReportedDefect } from './types';

export type { ReportedDefect };

/** POST …/machines/:machineId/defects (any farm role; critical tags the machine out). */
export const reportDefect = (orgId: string, machineId: string, input: DefectCreateInput) =>
  apiClient.post<ReportedDefect>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/defects`,
    input,
  );

export function useReportDefect(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ machineId, input }: { machineId: string; input: DefectCreateInput }) =>
      reportDefect(orgId, machineId, input),
    onSuccess: () => invalidate(queryClient, changedBy.defects(orgId)),
  });
}
