// Truth tables of server/policies/service-record.ts. Callers: see callers.ts. Every expected cell
// is written by hand from DESIGN.md and the policy's doc: the shop (the farm's managers and
// technicians, and a dealer holding a `service` link) records, plans, completes and cancels
// services; everyone on the farm sees the history, a dealer only with `service`; a sold machine
// takes no new record; a cancelled record is closed; only a planned one completes or cancels.
import { describe, expect, it } from 'vitest';
import type { Machine, ServiceRecord } from '../../../server/models';
import type { OrgAccess } from '../../../server/policies/access';
import {
  canAttachToServiceRecord,
  canCancelServiceRecord,
  canCompleteServiceRecord,
  canRecordService,
  canUpdateServiceRecord,
  canViewServiceRecords,
  canViewShopWeek,
  isShop,
  serviceRecordAbilities,
} from '../../../server/policies/service-record';
import type { MachineStatus } from '../../../shared/constants';
import type { ServiceStatus } from '../../../shared/schemas/service-records';
import { FARM, N, Y, accessOn, CALLERS, cells, may, type Row } from './callers';

const machine = (status: MachineStatus) => ({ id: 'machine-1', status }) as Machine;
const record = (status: ServiceStatus) => ({ id: 'record-1', status }) as ServiceRecord;
const planned = record('planned');
const completed = record('completed');
const cancelled = record('cancelled');

const POLICIES = {
  'is shop': isShop,
  'view service records': (a: OrgAccess) => canViewServiceRecords(a, machine('in_service')),
  'record service, in service': (a: OrgAccess) => canRecordService(a, machine('in_service')),
  'record service, tagged out': (a: OrgAccess) => canRecordService(a, machine('tagged_out')),
  'record service, sold': (a: OrgAccess) => canRecordService(a, machine('sold')),
  'update, planned': (a: OrgAccess) => canUpdateServiceRecord(a, planned),
  'update, completed': (a: OrgAccess) => canUpdateServiceRecord(a, completed),
  'update, cancelled': (a: OrgAccess) => canUpdateServiceRecord(a, cancelled),
  'complete, planned': (a: OrgAccess) => canCompleteServiceRecord(a, planned),
  'complete, completed': (a: OrgAccess) => canCompleteServiceRecord(a, completed),
  'complete, cancelled': (a: OrgAccess) => canCompleteServiceRecord(a, cancelled),
  'cancel, planned': (a: OrgAccess) => canCancelServiceRecord(a, planned),
  'cancel, completed': (a: OrgAccess) => canCancelServiceRecord(a, completed),
  'cancel, cancelled': (a: OrgAccess) => canCancelServiceRecord(a, cancelled),
  'attach, planned': (a: OrgAccess) => canAttachToServiceRecord(a, planned),
  'attach, completed': (a: OrgAccess) => canAttachToServiceRecord(a, completed),
  'attach, cancelled': (a: OrgAccess) => canAttachToServiceRecord(a, cancelled),
  'view shop week': canViewShopWeek,
};

// Columns: manager, technician, operator (assigned), operator (not assigned), dealer (view link),
// dealer (service link), dealer (unlinked), stranger.
const SHOP: Row = [Y, Y, N, N, N, Y, N, N];
const NOBODY: Row = [N, N, N, N, N, N, N, N];
const TABLE: Record<keyof typeof POLICIES, Row> = {
  'is shop': SHOP,
  'view service records': [Y, Y, Y, Y, N, Y, N, N],
  'record service, in service': SHOP,
  'record service, tagged out': SHOP,
  'record service, sold': NOBODY,
  'update, planned': SHOP,
  'update, completed': SHOP,
  'update, cancelled': NOBODY,
  'complete, planned': SHOP,
  'complete, completed': NOBODY,
  'complete, cancelled': NOBODY,
  'cancel, planned': SHOP,
  'cancel, completed': NOBODY,
  'cancel, cancelled': NOBODY,
  'attach, planned': SHOP,
  'attach, completed': SHOP,
  'attach, cancelled': NOBODY,
  'view shop week': SHOP,
};

describe('policies/service-record — on the farm', () => {
  it.each(cells(TABLE))('service record — %s — %s → %s', (ability, relation, expected) => {
    expect(may(FARM, relation, POLICIES[ability])).toBe(expected);
  });
});

describe('policies/service-record — serviceRecordAbilities, whole objects', () => {
  it('abilities — dealer with a service link, planned record — update, complete, cancel, attach', () => {
    const access = accessOn(FARM, CALLERS['dealer (service link)'])!;
    expect(serviceRecordAbilities(access, planned)).toEqual({
      update: true,
      complete: true,
      cancel: true,
      attach: true,
    });
  });

  it('abilities — manager, completed record — update and attach, no complete or cancel', () => {
    const access = accessOn(FARM, CALLERS.manager)!;
    expect(serviceRecordAbilities(access, completed)).toEqual({
      update: true,
      complete: false,
      cancel: false,
      attach: true,
    });
  });

  it('abilities — operator, planned record — nothing', () => {
    const access = accessOn(FARM, CALLERS['operator (assigned)'])!;
    expect(serviceRecordAbilities(access, planned)).toEqual({
      update: false,
      complete: false,
      cancel: false,
      attach: false,
    });
  });
});
