// Query keys of service records, general to specific, so a write invalidates what it changed.
export const serviceKeys = {
  all: ['service-records'] as const,
  lists: () => [...serviceKeys.all, 'list'] as const,
  machine: (orgId: string, machineId: string) =>
    [...serviceKeys.lists(), orgId, machineId] as const,
  list: (orgId: string, machineId: string, filters: { q: string; page: number }) =>
    [...serviceKeys.machine(orgId, machineId), filters] as const,
  details: () => [...serviceKeys.all, 'detail'] as const,
  detail: (orgId: string, recordId: string) => [...serviceKeys.details(), orgId, recordId] as const,
  prefill: (orgId: string, machineId: string, taskIds: readonly string[]) =>
    [...serviceKeys.all, 'prefill', orgId, machineId, taskIds] as const,
  shopPeople: (orgId: string) => [...serviceKeys.all, 'shop-people', orgId] as const,
  activeDefects: (orgId: string, machineId: string) =>
    [...serviceKeys.all, 'active-defects', orgId, machineId] as const,
};

export const measurementKeys = {
  all: ['measurements'] as const,
  names: (orgId: string, machineId: string) => [...measurementKeys.all, orgId, machineId] as const,
  series: (orgId: string, machineId: string, name: string) =>
    [...measurementKeys.names(orgId, machineId), 'series', name] as const,
};

export const shopWeekKeys = {
  all: ['shop-week'] as const,
  organization: (orgId: string) => [...shopWeekKeys.all, orgId] as const,
  /** `start` null: the server's current week */
  week: (orgId: string, start: string | null) =>
    [...shopWeekKeys.organization(orgId), start ?? 'current'] as const,
};

/**
 * Keys of other features that a completed service changes. A feature never imports another, so
 * these are the literal prefixes: the machine's tasks (due points), its detail and readings, the
 * fleet list, the due lists, the latest readings and the defects lists.
 */
export const foreignKeys = {
  machineTasks: (orgId: string, machineId: string) => ['tasks', 'list', orgId, machineId] as const,
  machineDetail: (orgId: string, machineId: string) =>
    ['machines', 'detail', orgId, machineId] as const,
  machineReadings: (orgId: string, machineId: string) =>
    ['machine-readings', orgId, machineId] as const,
  machineLists: (orgId: string) => ['machines', 'list', orgId] as const,
  latestReadings: (orgId: string) => ['readings', 'latest', orgId] as const,
  due: ['due'] as const,
  defects: ['defects'] as const,
};
