import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { BulkReadingsInput } from '../../../../shared/schemas/readings';
import { apiClient, segment } from '../../../lib/api-client';
import { readingKeys } from './keys';
import type { BulkReadingsResponse } from './types';

/** POST readings/bulk: every reading is written, or none (422 with `readings.<i>.<field>`). */
export const saveReadings = (orgId: string, input: BulkReadingsInput) =>
  apiClient
    .post<BulkReadingsResponse>(`/organizations/${segment(orgId)}/readings/bulk`, input)
    .then((body) => body.data);

/** `alsoInvalidate`: other features' keys the new readings change (the due list). */
export function useSaveReadings(orgId: string, options: { alsoInvalidate?: QueryKey[] } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BulkReadingsInput) => saveReadings(orgId, input),
    onSuccess: () =>
      Promise.all(
        [readingKeys.latest(orgId), ...(options.alsoInvalidate ?? [])].map((queryKey) =>
          queryClient.invalidateQueries({ queryKey }),
        ),
      ),
  });
}
