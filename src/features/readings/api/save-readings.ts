import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BulkReadingsInput } from '../../../../shared/schemas/readings';
import { apiClient, segment } from '../../../lib/api-client';
import type { BulkReadingsResponse } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** POST readings/bulk: every reading is written, or none (422 with `readings.<i>.<field>`). */
export const saveReadings = (orgId: string, input: BulkReadingsInput) =>
  apiClient
    .post<BulkReadingsResponse>(`/organizations/${segment(orgId)}/readings/bulk`, input)
    .then((body) => body.data);

/** New readings move every machine's figures: the fleet, the due points, Log hours. */
export function useSaveReadings(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BulkReadingsInput) => saveReadings(orgId, input),
    onSuccess: () => invalidate(queryClient, changedBy.readings(orgId)),
  });
}
