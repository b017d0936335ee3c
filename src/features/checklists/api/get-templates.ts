import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { ChecklistTemplateList } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The farm's checklists, one per category at most. */
export const getTemplates = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<ChecklistTemplateList>(`/organizations/${segment(orgId)}/checklist-templates`, {
    signal,
  });

export const templatesQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.checklistTemplates.list(orgId),
    queryFn: ({ signal }) => getTemplates(orgId, signal),
  });

export const useTemplates = (orgId: string) => useQuery(templatesQueryOptions(orgId));
