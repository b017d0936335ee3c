import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineFilters, MachineList } from './types';
import { queryKeys } from '../../../lib/query-keys';

function toSearch(filters: MachineFilters): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) {
    if (value !== undefined && value !== '') search.set(key, String(value));
  }
  return search.toString();
}

/** One page of the fleet: the server filters, sorts and pages, so 2,000 machines stay fast. */
export const getMachines = (orgId: string, filters: MachineFilters, signal?: AbortSignal) =>
  apiClient.get<MachineList>(`/organizations/${segment(orgId)}/machines?${toSearch(filters)}`, {
    signal,
  });

export const machinesQueryOptions = (orgId: string, filters: MachineFilters) =>
  queryOptions({
    queryKey: queryKeys.machines.list(orgId, filters),
    queryFn: ({ signal }) => getMachines(orgId, filters, signal),
  });

// The previous page stays on screen while the next one loads, so the table does not flash empty.
export const useMachines = (orgId: string, filters: MachineFilters) =>
  useQuery({ ...machinesQueryOptions(orgId, filters), placeholderData: keepPreviousData });

/** What the caller may do on the fleet page (add machines), read from the page on screen. */
export function useFleetAbilities(orgId: string, filters: MachineFilters) {
  const { data } = useMachines(orgId, filters);
  return data?.abilities ?? { create: false };
}
