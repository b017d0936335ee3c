// The reading write path (issue 12): what one post asks of the database does not grow with the
// machine's history, and values are judged as their numeric(14,2) column stores them.
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { MeterReading } from '../../server/models';
import { primaryForecastOf } from '../../server/services/primary-forecast';
import { asStoredValue } from '../../server/services/readings';
import { refreshMachineForecast } from '../../server/services/forecast';

const app = createApp();
const DAY = 86_400_000;
const iso = (msAgo: number) => new Date(Date.now() - msAgo).toISOString();

beforeEach(resetDatabase);

async function farm() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  return { org, agent };
}

/** The SQL statements sent while `send` runs (whitespace collapsed). */
async function statementsOf(send: () => Promise<unknown>) {
  const seen: string[] = [];
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  options.logging = (sql: string) =>
    seen.push(sql.replace(/^Executing \([^)]*\): /, '').replace(/\s+/g, ' '));
  try {
    await send();
  } finally {
    options.logging = false;
  }
  return seen;
}

describe('reading write path', () => {
  it('one post — the same statements on 3 readings as on 400, none reads the whole history, at most 6 statements, one write of the summary', async () => {
    const { org, agent } = await farm();
    const small = await createMachine(org);
    const large = await createMachine(org);
    await addReadings(
      small,
      [3, 2, 1].map((d) => ({ daysAgo: d, value: 100 - d })),
    );
    await addReadings(
      large,
      Array.from({ length: 400 }, (_, i) => ({ daysAgo: 400 - i, value: i * 5 })),
    );
    for (const m of [small, large]) await createTask(m, { intervalMeter: 250, lastDoneMeter: 0 });
    const post = (machineId: string, value: number) =>
      agent
        .post(`/api/v1/organizations/${org.id}/machines/${machineId}/readings`)
        .send({ value, takenAt: iso(60_000) })
        .expect(201);
    const onSmall = await statementsOf(() => post(small.id, 100));
    const onLarge = await statementsOf(() => post(large.id, 2000));
    // each statement by its first words (ids and values differ)
    const heads = (list: string[]) => list.map((sql) => sql.replace(/'[^']*'/g, '?').slice(0, 90));
    expect(heads(onLarge)).toEqual(heads(onSmall));
    // a full rebuild selects every reading of the machine's meters in order, with no bound on time
    const wholeHistory = (sql: string) =>
      /FROM machine_meters mm LEFT JOIN meter_readings r ON .* WHERE mm.organization_id = \S+ AND mm.machine_id = \S+ ORDER BY/.test(
        sql,
      );
    const rebuild = await statementsOf(() => refreshMachineForecast(large.id, org.id));
    expect(rebuild.filter(wholeHistory)).toHaveLength(1);
    expect(onLarge.filter(wholeHistory)).toEqual([]);
    expect(onLarge.filter((sql) => /INTO "?machine_forecasts\b/.test(sql))).toHaveLength(1);
    expect(onLarge.filter((sql) => /INTO "?task_due_points\b/.test(sql))).toHaveLength(1);
    // session; BEGIN; the machine loaded and locked; what the rules and summary read; all the
    // writes; COMMIT
    expect(onLarge.length).toBeLessThanOrEqual(6);
    const stored = (await primaryForecastOf(large))!;
    expect(stored.readingCount).toBe(401);
    expect(stored.lastValue).toBe(2000);
  });

  // PostgreSQL rounds a numeric's input to its scale, half away from zero ("Numeric Types",
  // PostgreSQL 15 manual §8.1.2); the value is sent as JavaScript prints it (1.005, not 1.00499…).
  it.each([
    [1.005, 1.01],
    [2.675, 2.68],
    [0.001, 0],
    [1234.565, 1234.57],
    [0.1 + 0.2, 0.3],
  ])('asStoredValue — %s is stored as %s', (sent, kept) => {
    expect(asStoredValue(sent)).toBe(kept);
  });

  it('a value that differs from a stored reading only past the second decimal, at its time — a repeat (201 duplicate), never a 500', async () => {
    const { org, agent } = await farm();
    const machine = await createMachine(org);
    const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/readings`;
    const takenAt = iso(DAY);
    expect((await agent.post(url).send({ value: 500, takenAt })).body.status).toBe('added');
    const again = await agent.post(url).send({ value: 500.004, takenAt });
    expect(again.status).toBe(201);
    expect(again.body.status).toBe('duplicate');
    expect(await countRows('meter_readings')).toBe(1);
  });

  it('a correction onto another reading’s time and value — 422 naming takenAt, nothing changes', async () => {
    const { org, agent } = await farm();
    const machine = await createMachine(org);
    await addReadings(machine, [
      { daysAgo: 3, value: 100 },
      { daysAgo: 1, value: 120 },
    ]);
    const [first, second] = await MeterReading.findAll({
      where: { machineId: machine.id },
      order: [['takenAt', 'ASC']],
    });
    const res = await agent
      .patch(`/api/v1/organizations/${org.id}/readings/${second.id}`)
      .send({ value: 100, takenAt: first.takenAt.toISOString() });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.takenAt).toMatch(/already recorded/);
    await second.reload();
    expect(second.value).toBe(120);
  });
});
