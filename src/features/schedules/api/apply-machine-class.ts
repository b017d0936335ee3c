import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { MachineClass } from '../../../../shared/domain/service-library';
import type {
  MachineClassApplied,
  machineClassAppliedResponseSchema,
} from '../../../../shared/schemas/service-library';
import type { z } from 'zod';

export type { MachineClassApplied };

export const applyMachineClass = (orgId: string, machineId: string, machineClass: MachineClass) =>
  apiClient
    .post<z.infer<typeof machineClassAppliedResponseSchema>>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/apply-class`,
      { machineClass },
    )
    .then((body) => body.data);

/** Gives the machine a class of the service library and adds the class's tasks it lacks. */
export function useApplyMachineClass(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (machineClass: MachineClass) => applyMachineClass(orgId, machineId, machineClass),
    onSuccess: () => invalidate(queryClient, changedBy.schedule(orgId, machineId)),
  });
}
