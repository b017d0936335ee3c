// Truth tables of server/policies/machine.ts. Callers: see callers.ts. Every expected cell is
// written by hand from DESIGN.md (operators see machines assigned to them, or unassigned ones;
// managers own the fleet; readings by anyone on the farm, corrections by the shop; a sold
// machine takes no readings) and the return-to-service rule (the farm's technicians and managers,
// never a dealer), not computed. A route loads the machine with canViewMachine before any other
// check, so the other rows are the policy alone.
import { describe, expect, it } from 'vitest';
import type { Machine } from '../../../server/models';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canCorrectReading,
  canCreateMachine,
  canEditSchedule,
  canImportReadings,
  canLogReading,
  canReplaceMeter,
  canRestrict,
  canReturnToService,
  canSetLastDone,
  canUpdateMachine,
  canViewMachine,
  machineAbilities,
} from '../../../server/policies/machine';
import type { MachineStatus } from '../../../shared/constants';
import { ASSIGNED_OPERATOR, FARM, N, Y, accessOn, CALLERS, cells, may, type Row } from './callers';

const machine = (status: MachineStatus) => ({ id: 'machine-1', status }) as Machine;
const inService = machine('in_service');
const taggedOut = machine('tagged_out');
const sold = machine('sold');
const restricted = { ...inService, restrictionReason: 'Field only — no road' } as Machine;

const POLICIES = {
  'view machine assigned to operator A': (a: OrgAccess) =>
    canViewMachine(a, inService, [ASSIGNED_OPERATOR]),
  'view machine assigned to nobody': (a: OrgAccess) => canViewMachine(a, inService, []),
  'create machine': canCreateMachine,
  'update machine': canUpdateMachine,
  'edit schedule': canEditSchedule,
  'set last done': canSetLastDone,
  'log reading, in service': (a: OrgAccess) => canLogReading(a, inService),
  'log reading, tagged out': (a: OrgAccess) => canLogReading(a, taggedOut),
  'log reading, sold': (a: OrgAccess) => canLogReading(a, sold),
  'correct reading': canCorrectReading,
  'replace meter': canReplaceMeter,
  'import readings': canImportReadings,
  'return to service': canReturnToService,
  'abilities.returnToService, tagged out': (a: OrgAccess) =>
    machineAbilities(a, taggedOut).returnToService,
  'abilities.returnToService, in service': (a: OrgAccess) =>
    machineAbilities(a, inService).returnToService,
  'abilities.logReading, sold': (a: OrgAccess) => machineAbilities(a, sold).logReading,
  'set or lift a restriction': canRestrict,
  'abilities.restrict, in service': (a: OrgAccess) => machineAbilities(a, inService).restrict,
  'abilities.restrict, tagged out': (a: OrgAccess) => machineAbilities(a, taggedOut).restrict,
  'abilities.restrict, sold': (a: OrgAccess) => machineAbilities(a, sold).restrict,
  'abilities.liftRestriction, restricted': (a: OrgAccess) =>
    machineAbilities(a, restricted).liftRestriction,
  'abilities.liftRestriction, not restricted': (a: OrgAccess) =>
    machineAbilities(a, inService).liftRestriction,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE: Record<keyof typeof POLICIES, Row> = {
  'view machine assigned to operator A': [Y, Y, Y, N, Y, Y, N, N],
  'view machine assigned to nobody': [Y, Y, Y, Y, Y, Y, N, N],
  'create machine': [Y, N, N, N, N, N, N, N],
  'update machine': [Y, N, N, N, N, N, N, N],
  'edit schedule': [Y, Y, N, N, N, N, N, N],
  'set last done': [Y, Y, N, N, N, N, N, N],
  'log reading, in service': [Y, Y, Y, Y, N, N, N, N],
  'log reading, tagged out': [Y, Y, Y, Y, N, N, N, N],
  'log reading, sold': [N, N, N, N, N, N, N, N],
  'correct reading': [Y, Y, N, N, N, N, N, N],
  'replace meter': [Y, Y, N, N, N, N, N, N],
  'import readings': [Y, Y, N, N, N, N, N, N],
  'return to service': [Y, Y, N, N, N, N, N, N],
  'abilities.returnToService, tagged out': [Y, Y, N, N, N, N, N, N],
  'abilities.returnToService, in service': [N, N, N, N, N, N, N, N],
  'abilities.logReading, sold': [N, N, N, N, N, N, N, N],
  // restricted use: the farm's shop only; operators report a defect, dealers never
  'set or lift a restriction': [Y, Y, N, N, N, N, N, N],
  'abilities.restrict, in service': [Y, Y, N, N, N, N, N, N],
  'abilities.restrict, tagged out': [Y, Y, N, N, N, N, N, N],
  'abilities.restrict, sold': [N, N, N, N, N, N, N, N],
  'abilities.liftRestriction, restricted': [Y, Y, N, N, N, N, N, N],
  'abilities.liftRestriction, not restricted': [N, N, N, N, N, N, N, N],
};

describe('policies/machine — on the farm', () => {
  it.each(cells(TABLE))('machine — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/machine — machineAbilities, whole objects', () => {
  it('machineAbilities — manager, tagged-out machine — every ability', () => {
    const access = accessOn(FARM, CALLERS.manager)!;
    expect(machineAbilities(access, taggedOut)).toEqual({
      update: true,
      editSchedule: true,
      setLastDone: true,
      logReading: true,
      correctReading: true,
      replaceMeter: true,
      returnToService: true,
      restrict: true,
      liftRestriction: false,
    });
  });

  it('machineAbilities — dealer with a service link, tagged-out machine — none (read only)', () => {
    const access = accessOn(FARM, CALLERS['dealer (service link)'])!;
    expect(machineAbilities(access, taggedOut)).toEqual({
      update: false,
      editSchedule: false,
      setLastDone: false,
      logReading: false,
      correctReading: false,
      replaceMeter: false,
      returnToService: false,
      restrict: false,
      liftRestriction: false,
    });
  });

  it('machineAbilities — operator, machine in service — log readings only', () => {
    const access = accessOn(FARM, CALLERS['operator (assigned)'])!;
    expect(machineAbilities(access, inService)).toEqual({
      update: false,
      editSchedule: false,
      setLastDone: false,
      logReading: true,
      correctReading: false,
      replaceMeter: false,
      returnToService: false,
      restrict: false,
      liftRestriction: false,
    });
  });
});
