import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeterReplacementInput } from '../../../../shared/schemas/readings';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { MeterReplacementResponse } from './types';

export const recordMeterReplacement = (
  orgId: string,
  machineId: string,
  input: MeterReplacementInput,
) =>
  apiClient
    .post<MeterReplacementResponse>(
      `/organizations/${segment(orgId)}/machines/${segment(machineId)}/meter-replacements`,
      input,
    )
    .then((body) => body.data);

/** A replacement shifts the lifetime values of later readings, so it changes what a reading does. */
export function useRecordMeterReplacement(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MeterReplacementInput) => recordMeterReplacement(orgId, machineId, input),
    onSuccess: () => invalidate(queryClient, changedBy.machineReadings(orgId, machineId)),
  });
}
