import type { Machine } from '../models';
import { hasRole, type OrgAccess } from './access';

/** Operators see machines assigned to them, and machines with no assignment at all. */
export const canViewMachine = (access: OrgAccess, _machine: Machine, assignedUserIds: string[]) =>
  !hasRole(access, 'operator') ||
  assignedUserIds.length === 0 ||
  assignedUserIds.includes(access.userId);
export const canCreateMachine = (access: OrgAccess) => hasRole(access, 'manager');
export const canUpdateMachine = (access: OrgAccess) => hasRole(access, 'manager');
export const canEditSchedule = (access: OrgAccess) => hasRole(access, 'manager', 'technician');
export const canSetLastDone = (access: OrgAccess) => hasRole(access, 'manager', 'technician');
/** A sold machine is retired: it takes no more readings, whoever asks. */
export const takesReadings = (machine: Machine) => machine.status !== 'sold';
export const canLogReading = (access: OrgAccess, machine: Machine) =>
  hasRole(access, 'manager', 'technician', 'operator') && takesReadings(machine);
/** What a refused reading says when the machine is sold (`name`: how the message names it). */
export const readingsClosedMessage = (name: string) => `${name} is sold; readings are closed`;
/** The 403 message of a refused reading: the sold machine's, else authorize()'s default. */
export const logReadingRefusal = (machine: Machine) =>
  takesReadings(machine) ? undefined : readingsClosedMessage('This machine');
export const canCorrectReading = (access: OrgAccess) => hasRole(access, 'manager', 'technician');
export const canReplaceMeter = (access: OrgAccess) => hasRole(access, 'manager', 'technician');
export const canImportReadings = (access: OrgAccess) => hasRole(access, 'manager', 'technician');
/** Returning a tagged-out machine to service: the farm's technicians and managers, never a dealer. */
export const canReturnToService = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');

/**
 * Setting and lifting a restricted use ("field only, no road"): the farm's technicians and
 * managers, who judge what the machine is fit for; never a dealer, and not an operator, whose
 * finding goes to them as a defect (a critical fail tags the machine out by itself).
 */
export const canRestrict = (access: OrgAccess) =>
  access.via === 'member' && hasRole(access, 'manager', 'technician');
/** The 403 message of a refused restriction, in the words of the one who asked. */
export const restrictRefusal = (access: OrgAccess) =>
  access.via === 'dealer'
    ? "A dealer's advisor never sets or lifts a farm's restriction; the farm's technician or manager does"
    : 'Only a technician or manager of the farm sets or lifts a restriction; report what you found as a defect';
/** A restriction is set on a machine that is still the farm's (a sold one has left the fleet). */
export const takesRestriction = (machine: Machine) => machine.status !== 'sold';

export const machineAbilities = (access: OrgAccess, machine: Machine) => ({
  update: canUpdateMachine(access),
  editSchedule: canEditSchedule(access),
  setLastDone: canSetLastDone(access),
  logReading: canLogReading(access, machine),
  correctReading: canCorrectReading(access),
  replaceMeter: canReplaceMeter(access),
  returnToService: canReturnToService(access) && machine.status === 'tagged_out',
  restrict: canRestrict(access) && takesRestriction(machine),
  liftRestriction: canRestrict(access) && machine.restrictionReason != null,
});
