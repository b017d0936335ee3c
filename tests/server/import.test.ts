import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { MeterReading } from '../../server/models';

const app = createApp();

async function setup(
  units: 'imperial' | 'metric' = 'imperial',
  role: 'manager' | 'operator' = 'manager',
) {
  const org = await createOrganization({
    timeZone: units === 'imperial' ? 'America/Chicago' : 'Europe/Dublin',
    units,
  });
  const { user } = await createMember(org, role);
  const t1 = await createMachine(org, { fleetNumber: 'T-01' });
  const t2 = await createMachine(org, { fleetNumber: 'T-02' });
  await addReadings(t1, [{ daysAgo: 60, value: 1000 }]);
  await addReadings(t2, [{ daysAgo: 60, value: 500 }]);
  const agent = await signedInAgent(app, user);
  const preview = (csv: string | Buffer) =>
    agent
      .post(`/api/v1/organizations/${org.id}/readings/import/preview`)
      .attach('file', Buffer.from(csv), 'readings.csv');
  const commit = (csv: string | Buffer) =>
    agent
      .post(`/api/v1/organizations/${org.id}/readings/import/commit`)
      .attach('file', Buffer.from(csv), 'readings.csv');
  return { org, t1, t2, agent, preview, commit };
}

// A date two days ago as yyyy-mm-dd, so the file never lies in the future.
const daysAgoIso = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);

describe('CSV import of readings', () => {
  beforeEach(resetDatabase);

  it('import — 401 without sign-in; 403 for an operator; nothing written', async () => {
    const { org } = await setup('imperial', 'operator');
    const anon = await request(app)
      .post(`/api/v1/organizations/${org.id}/readings/import/preview`)
      .attach('file', Buffer.from('a'), 'x.csv');
    expect(anon.status).toBe(401);
    const { preview } = await setup('imperial', 'operator');
    expect((await preview('fleet number,taken at,value\nT-01,2026-01-01,1\n')).status).toBe(403);
  });

  it('import — preview lists every row with its machine and each bad row by line number; writes nothing', async () => {
    const { preview } = await setup();
    const csv = [
      'Fleet number,Taken at,Value',
      `T-01,${daysAgoIso(30)} 08:00,1100`,
      `T-99,${daysAgoIso(30)},10`,
      `T-02,not a date,600`,
      `T-02,${daysAgoIso(20)},lots`,
      `T-01,${daysAgoIso(20)} 08:00,1050`,
      `T-02,${daysAgoIso(10)},520`,
    ].join('\n');
    const res = await preview(csv);
    expect(res.status).toBe(200);
    const rows = res.body.data.rows as {
      line: number;
      status: string;
      error: string | null;
      machine: { fleetNumber: string } | null;
    }[];
    expect(rows.map((r) => [r.line, r.status])).toEqual([
      [2, 'new'],
      [3, 'error'],
      [4, 'error'],
      [5, 'error'],
      [6, 'error'],
      [7, 'new'],
    ]);
    expect(rows[0].machine!.fleetNumber).toBe('T-01');
    expect(rows[1].error).toMatch(/^Line 3: fleet number "T-99" is not a machine of this farm/);
    expect(rows[2].error).toMatch(
      /^Line 4: taken at "not a date" must be an ISO date .* or MM\/DD\/YYYY/,
    );
    expect(rows[3].error).toMatch(/^Line 5: value "lots" must be a number/);
    expect(rows[4].error).toMatch(/^Line 6: .*lower than the previous reading of 1,100 h/);
    expect(res.body.data.summary).toEqual({ total: 6, new: 2, duplicates: 0, errors: 4 });
    expect(await countRows('meter_readings')).toBe(2);
  });

  it('import — commit with a bad row answers 422 naming the line and writes nothing at all', async () => {
    const { commit } = await setup();
    const res = await commit(
      `fleet number,taken at,value\nT-01,${daysAgoIso(30)},1100\nT-02,${daysAgoIso(30)},400\n`,
    );
    expect(res.status).toBe(422);
    expect(res.body.error.fields['line 3']).toMatch(/lower than the previous reading of 500 h/);
    expect(await countRows('meter_readings')).toBe(2);
  });

  it('import — semicolons, a BOM, CRLF and the farm local date format (US month first); the same file twice adds nothing', async () => {
    const { commit } = await setup('imperial');
    const d = new Date(Date.now() - 5 * 86_400_000);
    const us = `${String(d.getUTCMonth() + 1).padStart(2, '0')}/${String(d.getUTCDate()).padStart(2, '0')}/${d.getUTCFullYear()}`;
    const csv = Buffer.concat([
      Buffer.from([0xef, 0xbb, 0xbf]),
      Buffer.from(
        `fleet number;taken at;value\r\nT-01;${us} 07:30;1200,5\r\nT-02;${daysAgoIso(4)}T18:00:00Z;650\r\n`,
      ),
    ]);
    const first = await commit(csv);
    expect(first.status).toBe(201);
    expect(first.body.data).toEqual({ added: 2, duplicates: 0, total: 2 });
    const second = await commit(csv);
    expect(second.status).toBe(201);
    expect(second.body.data).toEqual({ added: 0, duplicates: 2, total: 2 });
    expect(await countRows('meter_readings')).toBe(4);
    const r = await MeterReading.findOne({ where: { value: 1200.5 } });
    expect(r!.source).toBe('import');
    // 07:30 in America/Chicago is 12:30 or 13:30 UTC depending on daylight saving time
    expect([12, 13]).toContain(r!.takenAt.getUTCHours());
  });

  it('import — metric farm reads dd/mm/yyyy (day first)', async () => {
    const { preview } = await setup('metric');
    const d = new Date(Date.now() - 3 * 86_400_000);
    const eu = `${String(d.getUTCDate()).padStart(2, '0')}/${String(d.getUTCMonth() + 1).padStart(2, '0')}/${d.getUTCFullYear()}`;
    const res = await preview(`fleet number,taken at,value\nT-01,${eu},1010\n`);
    expect(res.body.data.rows[0].status).toBe('new');
    expect(res.body.data.rows[0].takenAt.slice(0, 10)).toBe(d.toISOString().slice(0, 10));
  });

  // The size and row limits (50 MB, 500,000 rows) are tested in import-large.test.ts.
  it('import — missing columns, an empty file and no file are refused on "file"', async () => {
    const { preview, agent, org } = await setup();
    const noCols = await preview('machine,when\nT-01,2026-01-01\n');
    expect(noCols.status).toBe(422);
    expect(noCols.body.error.fields.file).toMatch(/missing: .*value/);
    const empty = await preview('');
    expect(empty.status).toBe(422);
    const none = await agent.post(`/api/v1/organizations/${org.id}/readings/import/preview`);
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toMatch(/Choose a CSV file/);
  });
});
