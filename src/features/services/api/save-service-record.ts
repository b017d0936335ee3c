import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  ServiceRecordCompleteInput,
  ServiceRecordCreateInput,
} from '../../../../shared/schemas/service-records';
import { apiClient, segment } from '../../../lib/api-client';
import type { RecordWithResets } from './types';
import { queryKeys } from '../../../lib/query-keys';
import { changedBy, invalidate } from '../../../lib/invalidation';

export const createServiceRecord = (
  orgId: string,
  machineId: string,
  input: ServiceRecordCreateInput,
) =>
  apiClient.post<RecordWithResets>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/service-records`,
    input,
  );

export const completeServiceRecord = (
  orgId: string,
  recordId: string,
  input: ServiceRecordCompleteInput,
) =>
  apiClient.post<RecordWithResets>(
    `/organizations/${segment(orgId)}/service-records/${segment(recordId)}/complete`,
    input,
  );

export type SaveServiceInput =
  | { kind: 'create'; body: ServiceRecordCreateInput }
  | { kind: 'complete'; recordId: string; body: ServiceRecordCompleteInput };

/** Records a visit, books a plan, or completes a plan; the answer carries the task resets. */
export function useSaveServiceRecord(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveServiceInput) =>
      input.kind === 'create'
        ? createServiceRecord(orgId, machineId, input.body)
        : completeServiceRecord(orgId, input.recordId, input.body),
    onSuccess: async (result) => {
      // the record page opens from the cache at once (the resets travel in the navigation state)
      queryClient.setQueryData(queryKeys.serviceRecords.detail(orgId, result.data.id), {
        data: result.data,
        abilities: result.abilities,
      });
      await invalidate(
        queryClient,
        changedBy.serviceRecord(orgId, machineId, {
          completed: result.data.status === 'completed',
        }),
      );
    },
  });
}
