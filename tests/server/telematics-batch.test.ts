// A whole fleet's ISO/TS 15143-3 snapshot written set-based (issue 13, "Speed"): the same readings,
// forecast rows and due points as the same readings posted one by one through the single-reading
// path (logReading), the same answer per item (a refusal, an identical repeat, unknown equipment),
// a resend adding nothing, and a statement count that does not grow with the number of machines.
// The clock is held still (Date only) so the two farms' forecasts are computed as of one instant.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { sequelize } from '../../server/db';
import { AppError } from '../../server/errors';
import { authenticateApiKey, createApiKey } from '../../server/services/api-keys';
import { logReading } from '../../server/services/reading-log';
import { ingestSnapshot } from '../../server/services/telematics';
import { resetDatabase } from '../support/db';
import { farmRows, lastValueOf, serialOf, twinFarm } from './telematics-batch-fixture';

const NOW = new Date('2026-06-10T15:30:00Z');
const H = 3_600_000;
const MACHINES = 500;
const REFUSED = 3; // sent below its last stored value
const REPEAT = 5; // sent as its last stored reading exactly (an identical repeat)

/** Machine i's reading in the snapshot: an hour ago, 4–10 h above its last stored value. */
function readingOf(i: number) {
  if (i === REFUSED) return { takenAt: new Date(NOW.getTime() - H), value: lastValueOf(i) - 5 };
  if (i === REPEAT)
    return { takenAt: new Date(NOW.getTime() - 2 * 86_400_000), value: lastValueOf(i) };
  return { takenAt: new Date(NOW.getTime() - H), value: lastValueOf(i) + 4 + (i % 7) + 0.25 };
}

const snapshot = (count: number) => ({
  Fleet: {
    version: '1',
    Equipment: [
      ...Array.from({ length: count }, (_, i) => ({
        EquipmentHeader: { OEMName: 'Brindle', Model: 'B-1', SerialNumber: serialOf(i) },
        CumulativeOperatingHours: {
          datetime: readingOf(i).takenAt.toISOString(),
          Hour: readingOf(i).value,
        },
      })),
      {
        EquipmentHeader: { OEMName: 'Brindle', Model: 'B-1', SerialNumber: 'NOT-OURS-1' },
        CumulativeOperatingHours: { datetime: NOW.toISOString(), Hour: 10 },
      },
    ],
  },
});

async function keyOf(access: Parameters<typeof createApiKey>[0]) {
  const { secret } = await createApiKey(access, { name: 'Yard feed', scopes: ['readings:write'] });
  return (await authenticateApiKey(secret))!;
}

/** Statements sent while `run` runs (Sequelize's logging sees direct statements too). */
async function statementsOf<T>(run: () => Promise<T>): Promise<{ result: T; statements: number }> {
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  let statements = 0;
  options.logging = () => void statements++;
  try {
    return { result: await run(), statements };
  } finally {
    options.logging = before;
  }
}

describe('ISO/TS 15143-3 snapshot of a whole fleet, set-based', () => {
  beforeEach(async () => {
    vi.useFakeTimers({ now: NOW, toFake: ['Date'] });
    await resetDatabase();
  });
  afterEach(() => vi.useRealTimers());

  it('500 machines in one post — the same readings, forecast rows and due points as one by one; a resend adds nothing', async () => {
    const batch = await twinFarm(MACHINES, NOW);
    const single = await twinFarm(MACHINES, NOW);
    const key = await keyOf(batch.access);

    const { result, statements } = await statementsOf(() =>
      ingestSnapshot(key, snapshot(MACHINES) as never),
    );
    expect(result.counts).toEqual({
      recorded: MACHINES - 2,
      alreadyThere: 1,
      refused: 1,
      unknownEquipment: 1,
      noHours: 0,
    });
    expect(result.items[REFUSED].reason).toMatch(/1,?049/);
    // before this was set-based: one context statement per machine (504 for 500 machines)
    expect(statements).toBeLessThanOrEqual(6);

    // the same readings through the single-reading path, one transaction each
    const statuses: string[] = [];
    for (const [i, machine] of single.machines.entries()) {
      const { value, takenAt } = readingOf(i);
      try {
        const outcome = await logReading(single.access, machine.id, {
          value,
          takenAt: takenAt.toISOString(),
        });
        statuses.push(outcome.status === 'added' ? 'recorded' : 'already_there');
      } catch (err) {
        if (!(err instanceof AppError) || err.status !== 422) throw err;
        statuses.push('refused');
      }
    }
    expect(result.items.slice(0, MACHINES).map((item) => item.status)).toEqual(statuses);
    const rows = await farmRows(batch.organization.id);
    expect(rows.readings).toHaveLength(MACHINES * 3 + MACHINES - 2);
    expect(rows.duePoints).toHaveLength(MACHINES * 2);
    expect(rows).toEqual(await farmRows(single.organization.id));

    const again = await ingestSnapshot(key, snapshot(MACHINES) as never);
    expect(again.counts).toMatchObject({ recorded: 0, alreadyThere: MACHINES - 1, refused: 1 });
    expect(await farmRows(batch.organization.id)).toEqual(rows);
    // a time limit, not a timed assertion: 1,000 machines built and 500 posts one by one
  }, 180_000);

  it('statements — a snapshot of 3 machines and one of 60 cost the same number', async () => {
    const farm = await twinFarm(60, NOW);
    const key = await keyOf(farm.access);
    const small = await statementsOf(() => ingestSnapshot(key, snapshot(3) as never));
    const large = await statementsOf(async () => {
      const fleet = snapshot(60);
      // later readings than the first post's, so every machine takes one
      for (const e of fleet.Fleet.Equipment) {
        e.CumulativeOperatingHours.datetime = new Date(NOW.getTime() - H / 2).toISOString();
        e.CumulativeOperatingHours.Hour += 0.25;
      }
      return ingestSnapshot(key, fleet as never);
    });
    expect(small.result.counts.recorded).toBe(3);
    expect(large.result.counts.recorded).toBe(59);
    expect(large.statements).toBe(small.statements);
  });
});
