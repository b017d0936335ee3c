import type { MachineCategory } from '../../../../shared/constants';

// Query keys of walkaround checklist templates, general to specific.
export const checklistKeys = {
  all: ['checklist-templates'] as const,
  lists: () => [...checklistKeys.all, 'list'] as const,
  list: (orgId: string) => [...checklistKeys.lists(), orgId] as const,
  builtIn: (orgId: string, category: MachineCategory) =>
    [...checklistKeys.all, 'built-in', orgId, category] as const,
};

/** The walkaround feature's checklists of machines (a literal prefix: features do not import each other). */
export const walkaroundChecklistsKey = ['walkarounds', 'checklist'] as const;
