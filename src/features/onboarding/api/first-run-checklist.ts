import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FirstRunChecklist } from '../../../../shared/schemas/onboarding';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

const path = (orgId: string) => `/organizations/${segment(orgId)}/first-run-checklist`;

export const firstRunChecklistQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.onboarding.checklist(orgId),
    queryFn: () =>
      apiClient.get<DataEnvelope<FirstRunChecklist>>(path(orgId)).then((body) => body.data),
  });

/** The checklist, for a farm's manager only (nobody else is asked for it). */
export const useFirstRunChecklist = (orgId: string, enabled: boolean) =>
  useQuery({ ...firstRunChecklistQueryOptions(orgId), enabled });

/** Puts the checklist away for the signed-in manager. */
export function useDismissFirstRunChecklist(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiClient
        .put<DataEnvelope<FirstRunChecklist>>(`${path(orgId)}/dismissal`, { dismissed: true })
        .then((body) => body.data),
    onSuccess: (data) => queryClient.setQueryData(queryKeys.onboarding.checklist(orgId), data),
  });
}
