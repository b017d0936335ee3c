// The reading-post benchmark's baseline: a bare Express + pg handler doing the writes a reading post
// makes — insert the reading, upsert the machine's summary row, upsert its 10 tasks' due points —
// in one transaction, with no sign-in, validation, neighbour checks or forecast math. It keeps each
// machine's stored summary and due points in memory (read once at start) and writes them back as
// they are, so it writes the same bytes the app does. Run as its own process on loopback:
//   tsx scripts/bench/readings-bare.ts <port>   (DATABASE_URL from the environment)
import express from 'express';
import pg from 'pg';

const port = Number(process.argv[2]);
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });

interface Stored {
  org: string;
  forecast: Record<string, unknown>;
  due: { task_id: string; status: string; sort_date: string | null; due: unknown }[];
}
const stored = new Map<string, Stored>();

async function load() {
  const forecasts = await pool.query(
    `SELECT machine_id, organization_id, daily, reading_count, usage, computed_on FROM machine_forecasts`,
  );
  for (const f of forecasts.rows)
    stored.set(f.machine_id, { org: f.organization_id, forecast: f, due: [] });
  const due = await pool.query(
    `SELECT task_id, machine_id, status, sort_date, due FROM task_due_points`,
  );
  for (const d of due.rows) stored.get(d.machine_id)?.due.push(d);
}

const app = express();
app.use(express.json({ limit: '1mb' }));
app.get('/health', (_req, res) => {
  res.json({ ok: true });
});
app.post('/machines/:machineId/readings', async (req, res) => {
  const machineId = req.params.machineId;
  const s = stored.get(machineId);
  const value = Number(req.body?.value);
  if (!s || !Number.isFinite(value)) {
    res.status(422).json({ error: { code: 'invalid', message: 'unknown machine or bad value' } });
    return;
  }
  const takenAt = new Date();
  const client = await pool.connect();
  try {
    await client.query('BEGIN');
    const inserted = await client.query(
      `INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at, source)
       VALUES ($1, $2, $3, $3, $4, 'manual') RETURNING id, value, taken_at`,
      [s.org, machineId, value, takenAt],
    );
    await client.query(
      `INSERT INTO machine_forecasts (machine_id, organization_id, daily, reading_count, last_value, last_raw_value,
                                      last_taken_at, first_taken_at, first_value, usage, computed_on, updated_at)
       VALUES ($1, $2, $3, $4, $5, $5, $6, $6, 0, $7, $8, now())
       ON CONFLICT (meter_id) DO UPDATE SET daily = excluded.daily, reading_count = excluded.reading_count,
         last_value = excluded.last_value, last_raw_value = excluded.last_raw_value,
         last_taken_at = excluded.last_taken_at, usage = excluded.usage, computed_on = excluded.computed_on,
         updated_at = excluded.updated_at`,
      [
        machineId,
        s.org,
        JSON.stringify(s.forecast.daily),
        s.forecast.reading_count,
        value,
        takenAt,
        JSON.stringify(s.forecast.usage),
        s.forecast.computed_on,
      ],
    );
    if (s.due.length) {
      await client.query(
        `INSERT INTO task_due_points (task_id, organization_id, machine_id, status, sort_date, due, computed_on, updated_at)
         SELECT t.task_id, $1, $2, t.status, t.sort_date, t.due, current_date, now()
         FROM jsonb_to_recordset($3::jsonb) AS t(task_id uuid, status text, sort_date date, due jsonb)
         ON CONFLICT (task_id) DO UPDATE SET status = excluded.status, sort_date = excluded.sort_date,
           due = excluded.due, computed_on = excluded.computed_on, updated_at = excluded.updated_at`,
        [s.org, machineId, JSON.stringify(s.due)],
      );
    }
    await client.query('COMMIT');
    const row = inserted.rows[0];
    res.status(201).json({
      data: { id: row.id, value: Number(row.value), takenAt: row.taken_at },
      status: 'added',
    });
  } catch (error) {
    await client.query('ROLLBACK');
    res.status(500).json({ error: { code: 'failed', message: String(error) } });
  } finally {
    client.release();
  }
});

await load();
app.listen(port, '127.0.0.1', () => console.log(`bare reading handler on 127.0.0.1:${port}`));
