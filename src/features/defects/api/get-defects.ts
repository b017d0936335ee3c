import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { DefectFilters, DefectList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const DEFECTS_PAGE_SIZE = 50;

function toSearch(filters: DefectFilters): string {
  const search = new URLSearchParams({
    status: filters.status,
    page: String(filters.page),
    pageSize: String(DEFECTS_PAGE_SIZE),
  });
  if (filters.severity) search.set('severity', filters.severity);
  if (filters.machineId) search.set('machineId', filters.machineId);
  if (filters.assignedTo) search.set('assignedTo', filters.assignedTo);
  return search.toString();
}

/** Defects, worst first (operators: of the machines they may see). */
export const getDefects = (orgId: string, filters: DefectFilters, signal?: AbortSignal) =>
  apiClient.get<DefectList>(`/organizations/${segment(orgId)}/defects?${toSearch(filters)}`, {
    signal,
  });

export const defectsQueryOptions = (orgId: string, filters: DefectFilters) =>
  queryOptions({
    queryKey: queryKeys.defects.list(orgId, filters),
    queryFn: ({ signal }) => getDefects(orgId, filters, signal),
  });

// The previous list stays while a new filter loads, so the page does not flash empty.
export const useDefects = (orgId: string, filters: DefectFilters) =>
  useQuery({ ...defectsQueryOptions(orgId, filters), placeholderData: keepPreviousData });
