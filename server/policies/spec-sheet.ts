import { hasRole, type OrgAccess } from './access';

/**
 * A machine's spec sheet. Anyone who may see the machine reads it (the route loads the machine
 * scoped, so an operator sees the sheets of the machines they see, and a linked dealer of either
 * access reads it as it reads the machine). Writing is the farm's managers and technicians, as
 * the schedule edits the sheet fills: a dealer's `service` link records services but never edits
 * a farm's schedule, so it does not edit the sheet either.
 */
export const canEditSpecSheet = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');

export const specSheetAbilities = (access: OrgAccess) => ({ update: canEditSpecSheet(access) });
