import { partialMatchKey, type QueryClient, type QueryKey } from '@tanstack/react-query';
import { queryKeys as k } from './query-keys';

// What each kind of write makes stale, as the key prefixes to invalidate: one list per write,
// whichever feature wrote it, so a reading logged on the machine page refreshes the Log hours list
// as much as one logged there. Narrow where the write names its machine, the organization's root
// of a resource where it may touch any of them. Derived figures follow their inputs: the due
// points (tasks, due list, shop week, fleet's worst state) move with readings, schedules,
// services and machine status.

/** The due figures of one machine, wherever they show. */
const dueOfMachine = (orgId: string, machineId: string): QueryKey[] => [
  k.tasks.machine(orgId, machineId),
  k.machines.detail(orgId, machineId),
  k.machines.lists(orgId),
  k.due.all(orgId),
  k.shopWeek.all(orgId),
];

/** A machine's status (in service, tagged out, sold), wherever it shows. */
const statusOfMachines = (orgId: string): QueryKey[] => [
  k.machines.all(orgId),
  k.due.all(orgId),
  k.shopWeek.all(orgId),
  k.readings.latest(orgId),
  k.walkarounds.all(orgId),
  k.defects.all(orgId),
  k.serviceRecords.allActiveDefects(orgId),
];

export const changedBy = {
  /** a reading logged, corrected or deleted on one machine, or its meter replaced */
  machineReadings: (orgId: string, machineId: string): QueryKey[] => [
    k.readings.all(orgId),
    // season hours count the readings
    k.seasonHours.all(orgId),
    ...dueOfMachine(orgId, machineId),
    k.walkarounds.checklists(orgId),
    // a tractor's reading moves the hours of what it pulls (the hitch log): their due figures too
    k.hitch.all(orgId),
    k.tasks.all(orgId),
    k.machines.details(orgId),
  ],

  /** a span of the hitch log started, ended, corrected or removed: the implement's hours move */
  hitch: (orgId: string): QueryKey[] => [
    k.hitch.all(orgId),
    k.readings.all(orgId),
    k.seasonHours.all(orgId),
    k.tasks.all(orgId),
    k.machines.all(orgId),
    k.due.all(orgId),
    k.shopWeek.all(orgId),
  ],

  /** readings of many machines at once (Log hours, a CSV import) */
  readings: (orgId: string): QueryKey[] => [
    k.readings.all(orgId),
    k.seasonHours.all(orgId),
    k.machines.all(orgId),
    k.tasks.all(orgId),
    k.due.all(orgId),
    k.shopWeek.all(orgId),
    k.walkarounds.checklists(orgId),
  ],

  /** a machine added by hand */
  machineCreated: (orgId: string): QueryKey[] => [
    k.machines.lists(orgId),
    k.readings.latest(orgId),
    k.walkarounds.machines(orgId),
    k.defects.machineOptions(orgId),
    k.onboarding.checklist(orgId),
  ],

  /** a machine's details edited, or the machine retired (name, fleet number, status) */
  machineUpdated: (orgId: string, machineId: string): QueryKey[] => [
    ...dueOfMachine(orgId, machineId),
    ...statusOfMachines(orgId),
  ],

  /** the photo of a machine (on its page and the fleet's cards) */
  machinePhoto: (orgId: string, machineId: string): QueryKey[] => [
    k.machines.detail(orgId, machineId),
    k.machines.lists(orgId),
  ],

  /** a machine tagged out or returned to service, or its use restricted or the restriction lifted */
  machineStatus: (orgId: string): QueryKey[] => statusOfMachines(orgId),

  /** a defect reported, assigned or closed: it may tag the machine out or free it */
  defects: (orgId: string): QueryKey[] => statusOfMachines(orgId),

  /** a walkaround sent: its meter reading, its defects and perhaps a tag-out */
  walkaround: (orgId: string): QueryKey[] => [
    ...statusOfMachines(orgId),
    k.readings.all(orgId),
    k.seasonHours.all(orgId),
    k.tasks.all(orgId),
  ],

  /** a machine's schedule: tasks added, edited, removed, counted from now, last done set */
  schedule: (orgId: string, machineId: string): QueryKey[] => [
    ...dueOfMachine(orgId, machineId),
    k.serviceRecords.prefills(orgId, machineId),
    k.onboarding.checklist(orgId),
    // each meter says how many tasks count on it
    k.readings.meters(orgId, machineId),
  ],

  /**
   * A service record written (recorded, booked, completed, cancelled): the machine's history and
   * the shop week always; when completed also what its reading, task resets and closed defects
   * move.
   */
  serviceRecord: (
    orgId: string,
    machineId: string,
    options: { recordId?: string; completed: boolean },
  ): QueryKey[] => [
    k.serviceRecords.machine(orgId, machineId),
    k.serviceRecords.activeDefects(orgId, machineId),
    k.shopWeek.all(orgId),
    ...(options.recordId ? [k.serviceRecords.detail(orgId, options.recordId)] : []),
    ...(options.completed
      ? [
          k.measurements.machine(orgId, machineId),
          k.readings.all(orgId),
          k.seasonHours.all(orgId),
          ...dueOfMachine(orgId, machineId),
          ...statusOfMachines(orgId),
          k.onboarding.checklist(orgId),
        ]
      : []),
  ],

  /** a machine's season plan set or removed: it is the forecast's pace for that season */
  seasonPlan: (orgId: string, machineId: string): QueryKey[] => [
    k.seasonHours.all(orgId),
    ...dueOfMachine(orgId, machineId),
  ],

  /** a machine's spec sheet saved: the sheet, and the task lines it fills (schedule, prefill) */
  specSheet: (orgId: string, machineId: string): QueryKey[] => [
    k.machines.specSheet(orgId, machineId),
    k.tasks.machine(orgId, machineId),
    k.serviceRecords.prefills(orgId, machineId),
  ],

  /** a fleet file imported: machines, their schedules and first readings */
  fleetImport: (orgId: string): QueryKey[] => [
    ...changedBy.readings(orgId),
    ...statusOfMachines(orgId),
    k.onboarding.checklist(orgId),
  ],

  /** a walkaround checklist template saved or removed */
  checklistTemplates: (orgId: string): QueryKey[] => [
    k.checklistTemplates.list(orgId),
    k.walkarounds.checklists(orgId),
  ],
};

/**
 * The fewest prefixes that cover these keys: duplicates and keys under another one go, so no query
 * is invalidated twice (a second invalidation would cancel and restart the first one's refetch).
 */
export function coveringKeys(keys: readonly QueryKey[]): QueryKey[] {
  const shortestFirst = [...keys].sort((a, b) => a.length - b.length);
  return shortestFirst.reduce<QueryKey[]>(
    (kept, key) => (kept.some((prefix) => partialMatchKey(key, prefix)) ? kept : [...kept, key]),
    [],
  );
}

/** Marks every query under these prefixes stale (the ones on screen fetch again). */
export async function invalidate(queryClient: QueryClient, keys: readonly QueryKey[]) {
  await Promise.all(
    coveringKeys(keys).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  );
}
