// Migration 0030: the forecast rows' daily summary and usage are stored lz4-compressed, and a
// summary written through the product reads back as it was (PostgreSQL's own catalogue says
// which method each column and each stored value uses: pg_attribute.attcompression,
// pg_column_compression()).
import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { MachineForecast } from '../../server/models';
import { resetDatabase } from '../support/db';
import { addReadings, createMachine, createOrganization } from '../support/factories';

describe('forecast rows — lz4 compression (migration 0030)', () => {
  it('daily and usage columns — compression lz4', async () => {
    const rows = await sequelize.query<{ attname: string; attcompression: string }>(
      `SELECT attname, attcompression FROM pg_attribute
        WHERE attrelid = 'machine_forecasts'::regclass AND attname IN ('daily', 'usage')
        ORDER BY attname`,
      { type: QueryTypes.SELECT },
    );
    expect(rows).toEqual([
      { attname: 'daily', attcompression: 'l' },
      { attname: 'usage', attcompression: 'l' },
    ]);
  });

  it('two years of daily readings — stored compressed with lz4 and read back whole', async () => {
    await resetDatabase();
    const org = await createOrganization();
    const machine = await createMachine(org);
    const points = Array.from({ length: 730 }, (_, i) => ({
      daysAgo: 730 - i,
      value: 1000 + 3 * i,
    }));
    await addReadings(machine, points);
    const [row] = await sequelize.query<{ method: string | null; bytes: number }>(
      `SELECT pg_column_compression(daily) AS method, pg_column_size(daily) AS bytes
         FROM machine_forecasts WHERE machine_id = :id`,
      { replacements: { id: machine.id }, type: QueryTypes.SELECT },
    );
    expect(row.method).toBe('lz4');
    const forecast = await MachineForecast.findOne({ where: { machineId: machine.id } });
    expect(forecast!.daily).toHaveLength(730);
    expect(forecast!.daily[729].value).toBe(1000 + 3 * 729);
  });
});
