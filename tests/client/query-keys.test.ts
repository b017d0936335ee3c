import { describe, expect, it } from 'vitest';
import { partialMatchKey, QueryClient, type QueryKey } from '@tanstack/react-query';
import { queryKeys as k } from '../../src/lib/query-keys';
import { changedBy, coveringKeys, invalidate } from '../../src/lib/invalidation';

const ORG = 'org-1';
const OTHER_ORG = 'org-2';
const M = 'machine-1';
const OTHER_M = 'machine-2';

describe('query keys — the exact keys', () => {
  it.each<[string, QueryKey, unknown[]]>([
    ['machines.all', k.machines.all(ORG), ['machines', ORG]],
    ['machines.list', k.machines.list(ORG, { page: 2 }), ['machines', ORG, 'list', { page: 2 }]],
    ['machines.detail', k.machines.detail(ORG, M), ['machines', ORG, 'detail', M]],
    ['readings.latest', k.readings.latest(ORG), ['readings', ORG, 'latest']],
    ['readings.machine', k.readings.machine(ORG, M), ['readings', ORG, 'machine', M]],
    ['tasks.machine', k.tasks.machine(ORG, M), ['tasks', ORG, 'machine', M]],
    ['due.list', k.due.list(ORG, { horizon: 30 }), ['due', ORG, 'list', { horizon: 30 }]],
    ['shopWeek.week (current)', k.shopWeek.week(ORG, null), ['shop-week', ORG, 'current']],
    [
      'serviceRecords.events',
      k.serviceRecords.events(ORG, M),
      ['service-records', ORG, 'machine', M, 'events'],
    ],
    ['members.operators', k.members.operators(ORG), ['members', ORG, 'operators']],
    ['session.me', k.session.me(), ['session', 'me']],
  ])('%s — %j', (_name, key, expected) => {
    expect(key).toEqual(expected);
  });
});

describe('query keys — a resource’s root covers its lists and details, in its organization only', () => {
  const byResource: [string, (orgId: string) => QueryKey, QueryKey[]][] = [
    [
      'machines',
      k.machines.all,
      [k.machines.lists(ORG), k.machines.list(ORG, { page: 1 }), k.machines.detail(ORG, M)],
    ],
    ['readings', k.readings.all, [k.readings.latest(ORG), k.readings.machine(ORG, M)]],
    ['tasks', k.tasks.all, [k.tasks.machine(ORG, M)]],
    ['due', k.due.all, [k.due.lists(ORG), k.due.list(ORG, { page: 3 })]],
    [
      'serviceRecords',
      k.serviceRecords.all,
      [
        k.serviceRecords.list(ORG, M, { q: '', page: 1 }),
        k.serviceRecords.events(ORG, M),
        k.serviceRecords.prefill(ORG, M, ['t1']),
        k.serviceRecords.activeDefects(ORG, M),
        k.serviceRecords.detail(ORG, 'r1'),
      ],
    ],
    ['shopWeek', k.shopWeek.all, [k.shopWeek.week(ORG, '2026-05-04'), k.shopWeek.week(ORG, null)]],
    [
      'defects',
      k.defects.all,
      [
        k.defects.list(ORG, { page: 1 }),
        k.defects.machineOptions(ORG),
        k.defects.completedRecords(ORG, M),
      ],
    ],
    [
      'walkarounds',
      k.walkarounds.all,
      [
        k.walkarounds.checklist(ORG, M, 'use'),
        k.walkarounds.machines(ORG),
        k.walkarounds.labelMachine(ORG, M),
      ],
    ],
    [
      'dealers',
      k.dealers.all,
      [
        k.dealers.boardPage(ORG, { page: 1 }),
        k.dealers.bookings(ORG),
        k.dealers.parts(ORG, 30, null),
      ],
    ],
    ['members', k.members.all, [k.members.list(ORG), k.members.operators(ORG)]],
  ];

  it.each(byResource)(
    '%s.all(org) — covers every key of the resource in that organization',
    (_name, all, keys) => {
      for (const key of keys) expect(partialMatchKey(key, all(ORG))).toBe(true);
    },
  );

  it.each(byResource)('%s.all(other org) — covers none of them', (_name, all, keys) => {
    for (const key of keys) expect(partialMatchKey(key, all(OTHER_ORG))).toBe(false);
  });

  it('machines.detail — one machine’s detail does not cover another’s; lists do not cover details', () => {
    expect(partialMatchKey(k.machines.detail(ORG, OTHER_M), k.machines.detail(ORG, M))).toBe(false);
    expect(partialMatchKey(k.machines.detail(ORG, M), k.machines.lists(ORG))).toBe(false);
    expect(partialMatchKey(k.readings.machine(ORG, M), k.readings.latest(ORG))).toBe(false);
  });
});

describe('coveringKeys — the fewest prefixes, each query invalidated once', () => {
  it('drops duplicates and keys under another one; keeps the rest in order of length', () => {
    expect(
      coveringKeys([
        k.machines.detail(ORG, M),
        k.due.all(ORG),
        k.machines.all(ORG),
        k.due.list(ORG, { page: 1 }),
        k.due.all(ORG),
        k.readings.latest(ORG),
      ]),
    ).toEqual([
      ['due', ORG],
      ['machines', ORG],
      ['readings', ORG, 'latest'],
    ]);
  });
});

/** Which of these cached queries a write leaves invalidated. */
async function invalidatedBy(keys: QueryKey[], cached: Record<string, QueryKey>) {
  const queryClient = new QueryClient();
  for (const key of Object.values(cached)) queryClient.setQueryData(key, { cached: true });
  await invalidate(queryClient, keys);
  return Object.entries(cached)
    .filter(([, key]) => queryClient.getQueryState(key)?.isInvalidated)
    .map(([name]) => name);
}

// A page of each screen a write may leave stale, in two organizations and two machines.
const screens: Record<string, QueryKey> = {
  logHoursList: k.readings.latest(ORG),
  machineReadings: k.readings.machine(ORG, M),
  otherMachineReadings: k.readings.machine(ORG, OTHER_M),
  machineDetail: k.machines.detail(ORG, M),
  otherMachineDetail: k.machines.detail(ORG, OTHER_M),
  fleetPage: k.machines.list(ORG, { page: 1 }),
  machineTasks: k.tasks.machine(ORG, M),
  otherMachineTasks: k.tasks.machine(ORG, OTHER_M),
  dueList: k.due.list(ORG, { horizon: 30, page: 1 }),
  shopWeek: k.shopWeek.week(ORG, null),
  serviceHistory: k.serviceRecords.list(ORG, M, { q: '', page: 1 }),
  activeDefects: k.serviceRecords.activeDefects(ORG, M),
  defectList: k.defects.list(ORG, { status: 'active', page: 1 }),
  walkaroundPicker: k.walkarounds.machines(ORG),
  onboarding: k.onboarding.checklist(ORG),
  otherOrgLogHours: k.readings.latest(OTHER_ORG),
  otherOrgDue: k.due.list(OTHER_ORG, { horizon: 30, page: 1 }),
};

describe('changedBy — what each write refreshes, and nothing of another organization', () => {
  it('a reading logged on the machine page — its history, its due points, the fleet, the due list, the shop week and the Log hours list', async () => {
    // a tractor's reading moves the hours of the implements it pulls (the hitch log), so every
    // machine's page and tasks of the farm are refreshed — never another farm's
    expect(await invalidatedBy(changedBy.machineReadings(ORG, M), screens)).toEqual([
      'logHoursList',
      'machineReadings',
      'otherMachineReadings',
      'machineDetail',
      'otherMachineDetail',
      'fleetPage',
      'machineTasks',
      'otherMachineTasks',
      'dueList',
      'shopWeek',
    ]);
  });

  it('readings of many machines (Log hours, CSV import) — every machine’s figures', async () => {
    expect(await invalidatedBy(changedBy.readings(ORG), screens)).toEqual([
      'logHoursList',
      'machineReadings',
      'otherMachineReadings',
      'machineDetail',
      'otherMachineDetail',
      'fleetPage',
      'machineTasks',
      'otherMachineTasks',
      'dueList',
      'shopWeek',
    ]);
  });

  it('a service record booked (not completed) — the machine’s history, its open defects and the shop week', async () => {
    expect(
      await invalidatedBy(changedBy.serviceRecord(ORG, M, { completed: false }), screens),
    ).toEqual(['shopWeek', 'serviceHistory', 'activeDefects']);
  });

  it('a service record completed — also the due list, the machine, its readings and status, the defects', async () => {
    expect(
      await invalidatedBy(changedBy.serviceRecord(ORG, M, { completed: true }), screens),
    ).toEqual([
      'logHoursList',
      'machineReadings',
      'otherMachineReadings',
      'machineDetail',
      'otherMachineDetail',
      'fleetPage',
      'machineTasks',
      'dueList',
      'shopWeek',
      'serviceHistory',
      'activeDefects',
      'defectList',
      'walkaroundPicker',
      'onboarding',
    ]);
  });

  it('a defect reported or closed — the machine’s status everywhere it shows', async () => {
    expect(await invalidatedBy(changedBy.defects(ORG), screens)).toEqual([
      'logHoursList',
      'machineDetail',
      'otherMachineDetail',
      'fleetPage',
      'dueList',
      'shopWeek',
      'activeDefects',
      'defectList',
      'walkaroundPicker',
    ]);
  });

  it('a walkaround sent — its reading and defects: status, readings and due points of the fleet', async () => {
    expect(await invalidatedBy(changedBy.walkaround(ORG), screens)).toEqual([
      'logHoursList',
      'machineReadings',
      'otherMachineReadings',
      'machineDetail',
      'otherMachineDetail',
      'fleetPage',
      'machineTasks',
      'otherMachineTasks',
      'dueList',
      'shopWeek',
      'activeDefects',
      'defectList',
      'walkaroundPicker',
    ]);
  });

  it('a schedule edit — the machine’s due points, the fleet, the due list, the shop week, the first-run checklist', async () => {
    expect(await invalidatedBy(changedBy.schedule(ORG, M), screens)).toEqual([
      'machineDetail',
      'fleetPage',
      'machineTasks',
      'dueList',
      'shopWeek',
      'onboarding',
    ]);
  });

  it('a machine added — the fleet, Log hours, the pickers and the first-run checklist', async () => {
    expect(await invalidatedBy(changedBy.machineCreated(ORG), screens)).toEqual([
      'logHoursList',
      'fleetPage',
      'walkaroundPicker',
      'onboarding',
    ]);
  });
});
