// Query keys of machine schedules, general to specific.
export const taskKeys = {
  all: ['tasks'] as const,
  lists: () => [...taskKeys.all, 'list'] as const,
  list: (orgId: string, machineId: string) => [...taskKeys.lists(), orgId, machineId] as const,
};

export const templateKeys = {
  all: ['schedule-templates'] as const,
  list: (orgId: string, category: string) => [...templateKeys.all, orgId, category] as const,
};

/**
 * Keys of other features that a schedule change makes stale. A feature never imports another,
 * so these are the literal prefixes: the machine's detail and the fleet list (worst due state,
 * next due date) of the machines feature, and the due list.
 */
export const foreignKeys = {
  machineDetail: (orgId: string, machineId: string) =>
    ['machines', 'detail', orgId, machineId] as const,
  machineLists: (orgId: string) => ['machines', 'list', orgId] as const,
  due: ['due'] as const,
};
