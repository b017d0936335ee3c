import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MachineCategory } from '../../../../shared/constants';
import { apiClient, segment } from '../../../lib/api-client';
import type { ScheduleTemplateList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getTemplates = (orgId: string, category: MachineCategory, signal?: AbortSignal) =>
  apiClient.get<ScheduleTemplateList>(
    `/organizations/${segment(orgId)}/schedule-templates?category=${segment(category)}`,
    { signal },
  );

export const templatesQueryOptions = (orgId: string, category: MachineCategory) =>
  queryOptions({
    queryKey: queryKeys.scheduleTemplates.list(orgId, category),
    queryFn: ({ signal }) => getTemplates(orgId, category, signal),
    staleTime: 5 * 60_000,
  });

export const useTemplates = (
  orgId: string,
  category: MachineCategory,
  options: { enabled?: boolean } = {},
) => useQuery({ ...templatesQueryOptions(orgId, category), enabled: options.enabled ?? true });
