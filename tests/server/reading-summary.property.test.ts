// The machine summary kept up to date by each reading write (server/services/reading-summary.ts)
// equals a full recomputation from every stored reading — summariseReadings over all of them,
// their count, and the first and last in (taken at, lifetime value) order — after every step of
// random histories: inserts out of order, several on one local day, around the daylight-saving
// changes of America/Chicago (the repeated hour included), batches, identical repeats,
// corrections, deletions and meter replacements (reading-summary-ops.ts). A refused step
// (422) must leave the readings exactly as they were; the stored usage and due point must be what
// the due math gives on the recomputed summary. The machine has two meters (issue 13: engine
// hours, its primary, and PTO hours) with a task on each; every step is on one of them, and each
// meter's summary and task must follow that meter's readings alone. Seeded, so a failure replays.
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { resetDatabase } from '../support/db';
import { createMachine, createMember, createOrganization } from '../support/factories';
import {
  MachineForecast,
  MachineMeter,
  MeterReading,
  ServiceTask,
  TaskDuePoint,
  type Machine,
  type Organization,
} from '../../server/models';
import type { OrgAccess } from '../../server/policies/context';
import { refreshMachineForecast, summariseReadings } from '../../server/services/forecast';
import { duePointsFor, storedUsage } from '../../server/services/due-points-of-meter';
import { dueTasksOf } from '../../server/services/forecast-rows';
import { applyStep, step } from './reading-summary-ops';

const TIME_ZONE = 'America/Chicago';
let org: Organization;
let access: OrgAccess;

beforeAll(async () => {
  await resetDatabase();
  org = await createOrganization({ timeZone: TIME_ZONE });
  const { user } = await createMember(org, 'manager');
  access = { organization: org, userId: user.id, role: 'manager', via: 'member' };
});

const allReadings = (machine: Machine, meterId: string) =>
  MeterReading.findAll({
    where: { machineId: machine.id, meterId },
    order: [
      ['takenAt', 'ASC'],
      ['lifetimeValue', 'ASC'],
    ],
  });

/** The summary as a full recomputation from every stored reading gives it. */
async function recomputed(machine: Machine, meterId: string) {
  const rows = await allReadings(machine, meterId);
  const first = rows[0];
  const last = rows.at(-1);
  return {
    daily: summariseReadings(rows, TIME_ZONE),
    readingCount: rows.length,
    firstTakenAt: first?.takenAt ?? null,
    firstValue: first?.lifetimeValue ?? null,
    lastTakenAt: last?.takenAt ?? null,
    lastValue: last?.lifetimeValue ?? null,
    lastRawValue: last?.value ?? null,
  };
}

async function stored(meterId: string) {
  const f = await MachineForecast.findByPk(meterId);
  if (!f) return null;
  return {
    daily: f.daily,
    readingCount: f.readingCount,
    firstTakenAt: f.firstTakenAt,
    firstValue: f.firstValue,
    lastTakenAt: f.lastTakenAt,
    lastValue: f.lastValue,
    lastRawValue: f.lastRawValue,
  };
}

/** The stored usage and due point equal the due math on the recomputed summary, as of their write. */
async function expectDueFromRecomputed(machine: Machine, task: ServiceTask, label: string) {
  const stored = await TaskDuePoint.findByPk(task.id);
  if (!stored) return;
  const forecast = (await MachineForecast.findByPk(task.meterId))!;
  const tasks = (await dueTasksOf(org.id, [machine.id])).filter((t) => t.meterId === task.meterId);
  expect(tasks.map((t) => t.id)).toEqual([task.id]);
  const { usage, points } = duePointsFor(
    await recomputed(machine, task.meterId),
    tasks,
    TIME_ZONE,
    stored.computedOn,
    stored.updatedAt,
  );
  // stored without its daily profiles (due-points-of-meter.ts storedUsage)
  expect(forecast.usage, `usage ${label}`).toEqual(storedUsage(usage));
  expect(stored.due, `due point ${label}`).toEqual(points.get(task.id));
}

const snapshot = async (machine: Machine, meterId: string) =>
  (await allReadings(machine, meterId)).map((r) => [
    r.id,
    r.value,
    r.lifetimeValue,
    r.takenAt.getTime(),
  ]);

describe('reading summary — incremental against a full recomputation', () => {
  it('random histories (seeded): after every insert, batch, repeat, correction, deletion and meter replacement the stored summary equals summariseReadings over all readings, with count, first and last', async () => {
    const outcomes = { done: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(step, fc.boolean()), { minLength: 5, maxLength: 30 }),
        fc.boolean(),
        async (steps, summarisedAtStart) => {
          const machine = await createMachine(org);
          const primary = (await MachineMeter.findOne({
            where: { machineId: machine.id, isPrimary: true },
          }))!;
          const pto = await MachineMeter.create({
            organizationId: org.id,
            machineId: machine.id,
            kind: 'pto_hours',
            unit: 'h',
            position: 1,
          });
          const meters = [
            { id: primary.id, named: false },
            { id: pto.id, named: true },
          ];
          // written directly, so the machine stays without a summary row until the first write
          const taskOn = (meterId: string, name: string) =>
            ServiceTask.create({
              organizationId: org.id,
              machineId: machine.id,
              meterId,
              name,
              intervalMeter: 250,
              intervalDays: 365,
              firstServiceMeter: null,
              warnMeter: 25,
              warnDays: 30,
              labourHours: 1,
              lastDoneMeter: 100,
              lastDoneOn: '2023-01-15',
            });
          const tasks = [
            await taskOn(primary.id, 'Engine oil and filter'),
            await taskOn(pto.id, 'PTO clutch check'),
          ];
          // a machine from before summaries were kept has no row; the first write builds it
          if (summarisedAtStart) await refreshMachineForecast(machine.id, org.id);
          for (const [i, [s, onPto]] of steps.entries()) {
            const meter = meters[onPto ? 1 : 0];
            const other = meters[onPto ? 0 : 1];
            const before = await snapshot(machine, meter.id);
            const untouched = await snapshot(machine, other.id);
            const outcome = await applyStep(access, machine, s, meter);
            outcomes[outcome]++;
            const label = `step ${i} (${s.kind} on ${onPto ? 'PTO' : 'engine'})`;
            if (outcome === 'refused') {
              expect(await snapshot(machine, meter.id), `${label} refused`).toEqual(before);
            }
            expect(await snapshot(machine, other.id), `${label}: the other meter`).toEqual(
              untouched,
            );
            for (const [k, m] of meters.entries()) {
              const summary = await stored(m.id);
              // no row yet: nothing was ever written on the machine
              if (!summary) expect((await snapshot(machine, m.id)).length).toBe(0);
              else expect(summary, `after ${label}`).toEqual(await recomputed(machine, m.id));
              await expectDueFromRecomputed(machine, tasks[k], `after ${label}`);
            }
          }
        },
      ),
      { seed: 20261202, numRuns: 40 },
    );
    // the sequences must exercise both sides: writes that land and writes refused
    expect(outcomes.done).toBeGreaterThan(200);
    expect(outcomes.refused).toBeGreaterThan(20);
  }, 240_000);
});
