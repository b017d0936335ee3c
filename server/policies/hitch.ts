import { hasRole, type OrgAccess } from './access';

/**
 * Hitching and unhitching: the farm's managers and technicians, and an operator assigned to
 * either machine (the one who drives the tractor or looks after the implement). A dealer reads.
 */
export const canHitch = (
  access: OrgAccess,
  implementOperators: string[],
  tractorOperators: string[],
) =>
  access.via === 'member' &&
  (hasRole(access, 'manager', 'technician') ||
    (hasRole(access, 'operator') &&
      (implementOperators.includes(access.userId) || tractorOperators.includes(access.userId))));

/** Correcting or removing a span once entered: the farm's managers and technicians. */
export const canCorrectHitch = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');

export const HITCH_REFUSAL =
  'Only a manager or technician, or an operator assigned to the implement or the tractor, may hitch and unhitch';
export const CORRECT_HITCH_REFUSAL = 'Only a manager or technician may correct the hitch log';
