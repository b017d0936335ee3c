// Truth tables of server/policies/defect.ts. Callers: see callers.ts. Every expected cell is
// written by hand from DESIGN.md (operators report defects; the farm's shop, its technicians and
// managers, assigns and closes them) and the rule that a dealer never sees or closes a farm's
// defects, whatever its link; not computed.
import { describe, expect, it } from 'vitest';
import type { Machine } from '../../../server/models';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canHandleDefects,
  canReportDefect,
  defectAbilities,
} from '../../../server/policies/defect';
import type { MachineStatus } from '../../../shared/constants';
import { FARM, N, Y, accessOn, CALLERS, cells, may, type Row } from './callers';

const machine = (status: MachineStatus) => ({ id: 'machine-1', status }) as Machine;

const POLICIES = {
  'report defect, in service': (a: OrgAccess) => canReportDefect(a, machine('in_service')),
  'report defect, tagged out': (a: OrgAccess) => canReportDefect(a, machine('tagged_out')),
  'report defect, sold': (a: OrgAccess) => canReportDefect(a, machine('sold')),
  'handle defects': canHandleDefects,
  'abilities.update': (a: OrgAccess) => defectAbilities(a).update,
  'abilities.close': (a: OrgAccess) => defectAbilities(a).close,
  'abilities.returnToService': (a: OrgAccess) => defectAbilities(a).returnToService,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const TABLE: Record<keyof typeof POLICIES, Row> = {
  'report defect, in service': [Y, Y, Y, Y, N, N, N, N],
  'report defect, tagged out': [Y, Y, Y, Y, N, N, N, N],
  'report defect, sold': [N, N, N, N, N, N, N, N],
  'handle defects': [Y, Y, N, N, N, N, N, N],
  'abilities.update': [Y, Y, N, N, N, N, N, N],
  'abilities.close': [Y, Y, N, N, N, N, N, N],
  'abilities.returnToService': [Y, Y, N, N, N, N, N, N],
};

describe('policies/defect — on the farm', () => {
  it.each(cells(TABLE))('defect — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });

  it('defectAbilities — technician — update, close and return to service', () => {
    expect(defectAbilities(accessOn(FARM, CALLERS.technician)!)).toEqual({
      update: true,
      close: true,
      returnToService: true,
    });
  });
});
