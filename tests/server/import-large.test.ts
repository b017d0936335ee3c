// The reading import at size (issue 12): server/services/reading-import*.ts and
// server/infra/csv-upload.ts through the API. Files are made here, not timed: 60,000 readings of
// three machines, one every 5 minutes per machine, the meter running 0.05 h in each (3 minutes in
// 5, under the 24 h a day an hour meter can run — common practice for an hour meter's bound).
import { createHash } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { MeterReading } from '../../server/models';
import { primaryForecastOf } from '../../server/services/primary-forecast';
import { READING_IMPORT_LIMITS } from '../../shared/schemas/readings';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const MIN5 = 5 * 60_000;
const DAY = 86_400_000;

async function setup() {
  const org = await createOrganization({ timeZone: 'America/Chicago', units: 'imperial' });
  const { user } = await createMember(org, 'manager');
  const machines = [];
  for (const fleetNumber of ['T-01', 'T-02', 'T-03']) {
    const m = await createMachine(org, { fleetNumber });
    await addReadings(m, [{ daysAgo: 100, value: 1000 }]);
    machines.push(m);
  }
  const agent = await signedInAgent(app, user);
  const send = (step: 'preview' | 'commit', csv: string | Buffer) =>
    agent
      .post(`/api/v1/organizations/${org.id}/readings/import/${step}`)
      .attach('file', Buffer.from(csv), 'readings.csv');
  return { org, machines, send };
}

/**
 * `perMachine` readings of T-01…T-03 from 90 days ago, in time order across the machines (line 2
 * is T-01's first). Reading k of a machine: 1,000 + 0.05·(k + 1) h, taken 90 days ago + 5·k min.
 */
function readingsFile(perMachine: number, edit?: (line: number, row: string[]) => string[]) {
  const start = Date.now() - 90 * DAY;
  const lines = ['fleet number,taken at,value'];
  for (let k = 0; k < perMachine; k++)
    for (const [i, fleet] of ['T-01', 'T-02', 'T-03'].entries()) {
      const at = new Date(start + k * MIN5 + i * 1000).toISOString();
      const row = [fleet, at, (1000 + 0.05 * (k + 1)).toFixed(2)];
      lines.push((edit?.(lines.length + 1, row) ?? row).join(','));
    }
  return `${lines.join('\n')}\n`;
}

// Large files take seconds on a shared 2-core machine; the limit is a test timeout, not a timing check.
describe('CSV import of readings — large files', { timeout: 180_000 }, () => {
  beforeEach(resetDatabase);

  it('import — 60,000 rows: the preview counts all and lists the first 200; the commit writes all with import keys and refreshes each forecast once; a resend adds nothing', async () => {
    const { machines, send } = await setup();
    const csv = readingsFile(20_000);
    const preview = await send('preview', csv);
    expect(preview.status).toBe(200);
    expect(preview.body.data.summary).toEqual({
      total: 60_000,
      new: 60_000,
      duplicates: 0,
      errors: 0,
    });
    const rows = preview.body.data.rows as { line: number; status: string }[];
    expect(rows.map((r) => r.line)).toEqual(Array.from({ length: 200 }, (_, i) => i + 2));
    expect(await countRows('meter_readings')).toBe(3);

    const commit = await send('commit', csv);
    expect(commit.status).toBe(201);
    expect(commit.body.data).toEqual({ added: 60_000, duplicates: 0, total: 60_000 });
    expect(await countRows('meter_readings')).toBe(60_003);
    // The import key is the file's SHA-256 (first 16 hex digits) and the line: worked out here.
    const digest = createHash('sha256').update(csv).digest('hex').slice(0, 16);
    const first = await MeterReading.findOne({ where: { importKey: `${digest}:2` } });
    expect(first).toMatchObject({ machineId: machines[0].id, value: 1000.05, source: 'import' });
    for (const m of machines) {
      const f = await primaryForecastOf(m);
      // 1 stored + 20,000 imported; the last of T-0x is 1,000 + 0.05 × 20,000 = 2,000 h
      expect(f).toMatchObject({ readingCount: 20_001, lastValue: 2000 });
    }

    const again = await send('commit', csv);
    expect(again.status).toBe(201);
    expect(again.body.data).toEqual({ added: 0, duplicates: 60_000, total: 60_000 });
    expect(await countRows('meter_readings')).toBe(60_003);
  });

  it('import — a reading at line 45,001 below the one before it is named by line in the preview and the commit, and nothing is written', async () => {
    const { send } = await setup();
    // Line 45,001 is T-03's reading k = 14,999 (lines 2–4 are k = 0): 1,750 h, written as 1,500.
    const csv = readingsFile(20_000, (line, row) =>
      line === 45_001 ? [row[0], row[1], '1500.00'] : row,
    );
    const preview = await send('preview', csv);
    expect(preview.status).toBe(200);
    expect(preview.body.data.summary).toMatchObject({ total: 60_000, errors: 1, new: 59_999 });
    const bad = (preview.body.data.rows as { line: number; error: string | null }[]).filter(
      (r) => r.error,
    );
    expect(bad).toHaveLength(1);
    expect(bad[0].line).toBe(45_001);
    expect(bad[0].error).toMatch(
      /^Line 45001: .*1,500 h is lower than the previous reading of 1,749\.95 h/,
    );

    const commit = await send('commit', csv);
    expect(commit.status).toBe(422);
    expect(commit.body.error.message).toBe('1 row cannot be imported; nothing was written');
    expect(Object.keys(commit.body.error.fields)).toEqual(['line 45001']);
    expect(await countRows('meter_readings')).toBe(3);
  });

  it('import — a value that is not a number at line 45,001 is refused by line and field before any check against neighbours', async () => {
    const { send } = await setup();
    const csv = readingsFile(20_000, (line, row) =>
      line === 45_001 ? [row[0], row[1], 'lots'] : row,
    );
    const commit = await send('commit', csv);
    expect(commit.status).toBe(422);
    expect(commit.body.error.fields['line 45001']).toMatch(
      /^Line 45001: value "lots" must be a number/,
    );
    // above the meter bound of every reading (shared/schemas/readings.ts METER_BOUNDS): refused, not a 500
    const huge = readingsFile(10, (line, row) =>
      line === 5 ? [row[0], row[1], '99999999999999'] : row,
    );
    const refused = await send('commit', huge);
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields['line 5']).toBe(
      'Line 5: value "99999999999999" is above 10,000,000, the most a meter value may be',
    );
    expect(await countRows('meter_readings')).toBe(3);
  });

  it('import — a value with three decimals is kept to the hundredth numeric(14,2) stores, so resending it adds nothing', async () => {
    const { send } = await setup();
    const at = new Date(Date.now() - DAY).toISOString();
    const csv = `fleet number,taken at,value\nT-01,${at},1200.555\n`;
    expect((await send('commit', csv)).body.data).toEqual({ added: 1, duplicates: 0, total: 1 });
    // 1,200.555 to the hundredth: 1,200.56 (worked by hand, half up)
    expect(await MeterReading.count({ where: { value: 1200.56 } })).toBe(1);
    expect((await send('commit', csv)).body.data).toEqual({ added: 0, duplicates: 1, total: 1 });
  });

  it('import — more than 500,000 rows is refused with 422 naming the file and the limit; over 50 MB with 413; nothing written', async () => {
    const { send } = await setup();
    const at = new Date(Date.now() - DAY).toISOString();
    const rowsOver = `fleet number,taken at,value\n${`T-01,${at},1001\n`.repeat(READING_IMPORT_LIMITS.maxRows + 1)}`;
    const many = await send('preview', rowsOver);
    expect(many.status).toBe(422);
    expect(many.body.error.fields.file).toBe(
      'readings.csv has more than 500,000 readings; at most 500,000 readings per file',
    );
    // 140-byte rows (a note column beside the three): 400,000 of them pass 50 MB first.
    const note = 'x'.repeat(100);
    const bytesOver = `fleet number,taken at,value,note\n${`T-01,${at},1001,${note}\n`.repeat(400_000)}`;
    expect(Buffer.byteLength(bytesOver)).toBeGreaterThan(READING_IMPORT_LIMITS.maxBytes);
    const big = await send('commit', bytesOver);
    expect(big.status).toBe(413);
    expect(big.body.error.fields.file).toBe(
      'readings.csv is larger than 50 MB; at most 50 MB per file',
    );
    expect(await countRows('meter_readings')).toBe(3);
  });
});
