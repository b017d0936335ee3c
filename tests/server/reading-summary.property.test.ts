// The machine summary kept up to date by each reading write (server/services/reading-summary.ts)
// equals a full recomputation from every stored reading — summariseReadings over all of them,
// their count, and the first and last in (taken at, lifetime value) order — after every step of
// random histories: inserts out of order, several on one local day, around the daylight-saving
// changes of America/Chicago (the repeated hour included), batches, identical repeats,
// corrections, deletions and meter replacements (reading-summary-ops.ts). A refused step
// (422) must leave the readings exactly as they were; the stored usage and due point must be what
// the due math gives on the recomputed summary. Seeded, so a failure replays.
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { resetDatabase } from '../support/db';
import { createMachine, createMember, createOrganization } from '../support/factories';
import {
  MachineForecast,
  MeterReading,
  ServiceTask,
  TaskDuePoint,
  type Machine,
  type Organization,
} from '../../server/models';
import type { OrgAccess } from '../../server/policies/context';
import {
  duePointsFor,
  refreshMachineForecast,
  summariseReadings,
} from '../../server/services/forecast';
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

const allReadings = (machine: Machine) =>
  MeterReading.findAll({
    where: { machineId: machine.id },
    order: [
      ['takenAt', 'ASC'],
      ['lifetimeValue', 'ASC'],
    ],
  });

/** The summary as a full recomputation from every stored reading gives it. */
async function recomputed(machine: Machine) {
  const rows = await allReadings(machine);
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

async function stored(machine: Machine) {
  const f = await MachineForecast.findByPk(machine.id);
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
  const forecast = (await MachineForecast.findByPk(machine.id))!;
  const tasks = await dueTasksOf(org.id, [machine.id]);
  const { usage, points } = duePointsFor(
    await recomputed(machine),
    tasks,
    TIME_ZONE,
    stored.computedOn,
    stored.updatedAt,
  );
  expect(forecast.usage, `usage ${label}`).toEqual(usage);
  expect(stored.due, `due point ${label}`).toEqual(points.get(task.id));
}

const snapshot = async (machine: Machine) =>
  (await allReadings(machine)).map((r) => [r.id, r.value, r.lifetimeValue, r.takenAt.getTime()]);

describe('reading summary — incremental against a full recomputation', () => {
  it('random histories (seeded): after every insert, batch, repeat, correction, deletion and meter replacement the stored summary equals summariseReadings over all readings, with count, first and last', async () => {
    const outcomes = { done: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(
        fc.array(step, { minLength: 5, maxLength: 30 }),
        fc.boolean(),
        async (steps, summarisedAtStart) => {
          const machine = await createMachine(org);
          // written directly, so the machine stays without a summary row until the first write
          const task = await ServiceTask.create({
            organizationId: org.id,
            machineId: machine.id,
            name: 'Engine oil and filter',
            intervalMeter: 250,
            intervalDays: 365,
            firstServiceMeter: null,
            warnMeter: 25,
            warnDays: 30,
            labourHours: 1,
            lastDoneMeter: 100,
            lastDoneOn: '2023-01-15',
          });
          // a machine from before summaries were kept has no row; the first write builds it
          if (summarisedAtStart) await refreshMachineForecast(machine.id, org.id);
          for (const [i, s] of steps.entries()) {
            const before = await snapshot(machine);
            const outcome = await applyStep(access, machine, s);
            outcomes[outcome]++;
            if (outcome === 'refused') {
              expect(await snapshot(machine), `step ${i} (${s.kind}) refused`).toEqual(before);
            }
            const summary = await stored(machine);
            // no row yet: nothing was ever written
            if (!summary) expect(before.length + (await snapshot(machine)).length).toBe(0);
            else expect(summary, `after step ${i} (${s.kind})`).toEqual(await recomputed(machine));
            await expectDueFromRecomputed(machine, task, `after step ${i} (${s.kind})`);
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
