import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DefectCreateInput } from '../../../../shared/schemas/defects';
import { apiClient, segment } from '../../../lib/api-client';
import { invalidateAfterDefectChange } from './invalidate';
import type { Defect, DefectAbilities, MachineRef } from './types';

export interface ReportedDefect {
  data: Defect;
  abilities: DefectAbilities;
  machine: MachineRef;
  taggedOut: boolean;
  /** what to tell the person when the report tagged the machine out */
  message: string | null;
}

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
    onSuccess: () => invalidateAfterDefectChange(queryClient),
  });
}
