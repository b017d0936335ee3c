import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadingCreateInput } from '../../../../shared/schemas/readings';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { ReadingLogged } from './types';

/** `status` 'duplicate': the same value at the same time was already there; nothing was added. */
export type LogReadingResult = ReadingLogged;

export const logReading = (orgId: string, machineId: string, input: ReadingCreateInput) =>
  apiClient.post<LogReadingResult>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/readings`,
    input,
  );

export function useLogReading(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReadingCreateInput) => logReading(orgId, machineId, input),
    onSuccess: () => invalidate(queryClient, changedBy.machineReadings(orgId, machineId)),
  });
}
