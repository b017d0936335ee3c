import type { DueFilters } from './types';

// Query keys of the due list, general to specific: a new reading or service changes every due
// list of its organization (any filter, any page), so mutations invalidate `organization(orgId)`.
export const dueKeys = {
  all: ['due'] as const,
  lists: () => [...dueKeys.all, 'list'] as const,
  organization: (orgId: string) => [...dueKeys.lists(), orgId] as const,
  list: (orgId: string, filters: DueFilters) => [...dueKeys.organization(orgId), filters] as const,
};
