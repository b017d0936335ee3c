// The import's one-pass check (server/services/reading-import-plan.ts) against planReadings
// (server/services/readings.ts), the check every other reading write goes through: over random
// files — rows of two machines in any order, repeated times, repeats of stored readings, values
// that go backwards or run faster than 24 h a day — each row comes out the same (new, duplicate,
// or the same error message). fast-check draws the files; a failure prints the smallest one.
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { MeterReading, type Machine, type Organization } from '../../server/models';
import type { MemberAccess } from '../../server/policies/context';
import { planReadings } from '../../server/services/readings';
import { resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const HOUR = 3_600_000;
// 30 days ago, on the hour: no row of a file is ever in the future
const BASE = Math.floor((Date.now() - 30 * 24 * HOUR) / HOUR) * HOUR;

interface FileRow {
  machine: 0 | 1;
  hour: number;
  /** half hours above 1,000 h */
  steps: number;
}

const fileRow = fc.record({
  machine: fc.constantFrom(0 as const, 1 as const),
  hour: fc.integer({ min: 0, max: 12 }),
  steps: fc.integer({ min: 0, max: 14 }),
});
// Stored readings at distinct hours, each 0.5 h per hour above 1,000 h: a valid history.
const storedHours = fc.uniqueArray(fc.integer({ min: 0, max: 12 }), { maxLength: 4 });

describe('reading import — one-pass check', () => {
  let org: Organization;
  let access: MemberAccess;
  let send: (csv: string) => Promise<{ status: number; body: { data: { rows: unknown[] } } }>;

  beforeAll(async () => {
    await resetDatabase();
    org = await createOrganization({ timeZone: 'America/Chicago', units: 'imperial' });
    const { user } = await createMember(org, 'manager');
    access = { organization: org, userId: user.id, role: 'manager', via: 'member' };
    const agent = await signedInAgent(app, user);
    send = (csv) =>
      agent
        .post(`/api/v1/organizations/${org.id}/readings/import/preview`)
        .attach('file', Buffer.from(csv), 'readings.csv');
  });

  /** Each row's outcome by planReadings, in a transaction rolled back. */
  async function reference(machines: Machine[], rows: FileRow[]) {
    const transaction = await sequelize.transaction();
    try {
      const items = rows.map((r) => ({
        machine: machines[r.machine],
        value: 1000 + r.steps / 2,
        takenAt: new Date(BASE + r.hour * HOUR),
        source: 'import' as const,
      }));
      const { outcomes, errors } = await planReadings(access, items, transaction, {
        fieldPrefix: (i) => `${i}.`,
      });
      return rows.map((_, i) => {
        const error = Object.entries(errors).find(([k]) => k.split('.')[0] === String(i));
        if (error) return { status: 'error', error: `Line ${i + 2}: ${error[1]}` };
        const repeat = outcomes.some((o) => o.index === i && o.status === 'duplicate');
        return { status: repeat ? 'duplicate' : 'new', error: null };
      });
    } finally {
      await transaction.rollback();
    }
  }

  it('import check — every row of a random file has the outcome planReadings gives it', async () => {
    let n = 0;
    await fc.assert(
      fc.asyncProperty(
        fc.tuple(storedHours, storedHours),
        fc.array(fileRow, { minLength: 1, maxLength: 30 }),
        async (stored, rows) => {
          const machines = [
            await createMachine(org, { fleetNumber: `P-${++n}a` }),
            await createMachine(org, { fleetNumber: `P-${n}b` }),
          ];
          await MeterReading.bulkCreate(
            stored.flatMap((hours, m) =>
              hours.map((h) => ({
                organizationId: org.id,
                machineId: machines[m].id,
                value: 1000 + h / 2,
                lifetimeValue: 1000 + h / 2,
                takenAt: new Date(BASE + h * HOUR),
                source: 'manual' as const,
              })),
            ),
          );
          const csv = [
            'fleet number,taken at,value',
            ...rows.map(
              (r) =>
                `${machines[r.machine].fleetNumber},${new Date(BASE + r.hour * HOUR).toISOString()},${(1000 + r.steps / 2).toFixed(1)}`,
            ),
          ].join('\n');
          const res = await send(csv);
          expect(res.status).toBe(200);
          const got = (res.body.data.rows as { status: string; error: string | null }[]).map(
            (r) => ({ status: r.status, error: r.error }),
          );
          expect(got).toEqual(await reference(machines, rows));
        },
      ),
      { numRuns: 100 },
    );
  }, 120_000);
});
