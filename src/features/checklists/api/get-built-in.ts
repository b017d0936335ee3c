import { useQuery } from '@tanstack/react-query';
import type { MachineCategory } from '../../../../shared/constants';
import { apiClient, segment } from '../../../lib/api-client';
import type { BuiltInChecklist } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getBuiltIn = (orgId: string, category: MachineCategory, signal?: AbortSignal) =>
  apiClient
    .get<{ data: BuiltInChecklist }>(
      `/organizations/${segment(orgId)}/checklist-templates/built-in/${segment(category)}`,
      { signal },
    )
    .then((body) => body.data);

/** Hourstone's own list of a category; it does not change while the app runs. */
export const useBuiltIn = (orgId: string, category: MachineCategory, enabled: boolean) =>
  useQuery({
    queryKey: queryKeys.checklistTemplates.builtIn(orgId, category),
    queryFn: ({ signal }) => getBuiltIn(orgId, category, signal),
    staleTime: Infinity,
    enabled,
  });
