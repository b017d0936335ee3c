import type { WalkaroundPurpose } from '../../../../shared/schemas/walkarounds';

// Query keys of walkarounds, general to specific.
export const walkaroundKeys = {
  all: ['walkarounds'] as const,
  checklists: () => [...walkaroundKeys.all, 'checklist'] as const,
  checklist: (orgId: string, machineId: string, purpose: WalkaroundPurpose) =>
    [...walkaroundKeys.checklists(), orgId, machineId, purpose] as const,
  allMachines: () => [...walkaroundKeys.all, 'machines'] as const,
  machines: (orgId: string) => [...walkaroundKeys.allMachines(), orgId] as const,
};

/**
 * Keys of other features that a sent walkaround changes (a feature never imports another, so
 * these are their literal prefixes): machine status and readings, the due list, the defects.
 */
export const changedByWalkaround = [
  ['machines'],
  ['readings'],
  ['machine-readings'],
  ['due'],
  ['defects'],
] as const;
