import type { MachineFilters } from './types';

// Query keys of the fleet, general to specific, so a write can invalidate exactly what changed.
export const machineKeys = {
  all: ['machines'] as const,
  lists: () => [...machineKeys.all, 'list'] as const,
  list: (orgId: string, filters: MachineFilters) =>
    [...machineKeys.lists(), orgId, filters] as const,
  details: () => [...machineKeys.all, 'detail'] as const,
  detail: (orgId: string, machineId: string) =>
    [...machineKeys.details(), orgId, machineId] as const,
  operators: (orgId: string) => [...machineKeys.all, 'operators', orgId] as const,
};

export const machineReadingKeys = {
  all: ['machine-readings'] as const,
  list: (orgId: string, machineId: string) =>
    [...machineReadingKeys.all, orgId, machineId] as const,
};

/**
 * Keys of other features that a machine change touches. A feature never imports another, so
 * these are the literal prefixes: the schedules feature's task list of a machine, the due list,
 * and (a status change) the defects and the walkaround picker.
 */
export const foreignKeys = {
  machineTasks: (orgId: string, machineId: string) => ['tasks', 'list', orgId, machineId] as const,
  due: ['due'] as const,
  defects: ['defects'] as const,
  walkaroundMachines: ['walkarounds', 'machines'] as const,
};
