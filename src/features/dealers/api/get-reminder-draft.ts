import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { ReminderDraft } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getReminderDraft = (
  orgId: string,
  customerId: string,
  taskIds: string[],
  signal?: AbortSignal,
) =>
  apiClient
    .get<DataEnvelope<ReminderDraft>>(
      `/organizations/${segment(orgId)}/customers/${segment(customerId)}/reminder-draft?taskIds=${taskIds.map(segment).join(',')}`,
      { signal },
    )
    .then((body) => body.data);

export const reminderDraftQueryOptions = (orgId: string, customerId: string, taskIds: string[]) =>
  queryOptions({
    queryKey: queryKeys.dealers.reminderDraft(orgId, customerId, taskIds),
    queryFn: ({ signal }) => getReminderDraft(orgId, customerId, taskIds, signal),
    staleTime: Infinity,
  });

export const useReminderDraft = (orgId: string, customerId: string, taskIds: string[]) =>
  useQuery(reminderDraftQueryOptions(orgId, customerId, taskIds));
