import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadingCreateInput } from '../../../../shared/schemas/readings';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import type { ReadingResponse } from './types';

export const correctReading = (
  orgId: string,
  readingId: string,
  input: Partial<ReadingCreateInput>,
) =>
  apiClient
    .patch<ReadingResponse>(
      `/organizations/${segment(orgId)}/readings/${segment(readingId)}`,
      input,
    )
    .then((body) => body.data);

export function useCorrectReading(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ readingId, ...input }: Partial<ReadingCreateInput> & { readingId: string }) =>
      correctReading(orgId, readingId, input),
    onSuccess: () => invalidate(queryClient, changedBy.machineReadings(orgId, machineId)),
  });
}
