import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SpecSheetSaved, SpecSheetUpdateInput } from '../../../../shared/schemas/spec-sheet';
import { apiClient } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import { queryKeys } from '../../../lib/query-keys';
import { specSheetUrl } from './get-spec-sheet';

/** Save the sections sent; the machine's task lines linked to the sheet follow on the server. */
export function useSaveSpecSheet(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SpecSheetUpdateInput) =>
      apiClient.patch<SpecSheetSaved>(specSheetUrl(orgId, machineId), input),
    onSuccess: (saved) => {
      queryClient.setQueryData(queryKeys.machines.specSheet(orgId, machineId), {
        data: saved.data,
        abilities: saved.abilities,
      });
      return invalidate(queryClient, changedBy.specSheet(orgId, machineId));
    },
  });
}
