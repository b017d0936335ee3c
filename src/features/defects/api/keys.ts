import type { DefectFilters } from './types';

// Query keys of defects, general to specific.
export const defectKeys = {
  all: ['defects'] as const,
  lists: () => [...defectKeys.all, 'list'] as const,
  list: (orgId: string, filters: DefectFilters) => [...defectKeys.lists(), orgId, filters] as const,
  machineOptions: (orgId: string) => [...defectKeys.all, 'machine-options', orgId] as const,
  shopPeople: (orgId: string) => [...defectKeys.all, 'shop-people', orgId] as const,
  completedRecords: (orgId: string, machineId: string) =>
    [...defectKeys.all, 'completed-records', orgId, machineId] as const,
};

/**
 * Keys of other features that a defect change touches (literal prefixes: a feature never
 * imports another): the machine's status shows on the fleet, the walkaround picker and the
 * machine page.
 */
export const changedByDefects = [['machines'], ['walkarounds', 'machines'], ['due']] as const;
