// `npm run bench -- import`. The reading CSV import (issue 12): one file of 200,000 readings checked
// (preview) and imported (commit) through the API running as its own process on loopback, against
// COPY FROM STDIN of the same rows into a scratch table with meter_readings' indexes; and the API
// process's resident memory (VmRSS, VmHWM from /proc) before and after the import.
//   --rows=N (default 200000)   --machines=N (default 50)
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { report } from './report';
import { serveApi } from './api-process';
import {
  IMPORT_EMAIL,
  IMPORT_PASSWORD,
  buildImportFarm,
  copyText,
  importFile,
} from './import-data';
import { signIn } from './scale-timing';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const ROWS = arg('rows', 200_000);
const MACHINES = arg('machines', 50);
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
const APP_PORT = 4319 + SLOT * 10;
const databaseUrl = process.env.DATABASE_URL!;
const rowsText = ROWS.toLocaleString('en-US');

/** Resident set now and its high-water mark of a process, in MB (Linux /proc/<pid>/status). */
function memoryMb(pid: number) {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (key: string) => Number(status.match(new RegExp(`^${key}:\\s+(\\d+) kB`, 'm'))![1]);
  return { rss: kb('VmRSS') / 1024, hwm: kb('VmHWM') / 1024 };
}

const readingCount = async () =>
  (
    await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM meter_readings', {
      type: QueryTypes.SELECT,
    })
  )[0].n;

const t0 = performance.now();
const farm = await buildImportFarm(databaseUrl, MACHINES);
const file = importFile(farm, ROWS, farm.userId);
console.log(
  `farm: ${MACHINES} machines × 10 tasks; file: ${file.rows.toLocaleString('en-US')} readings, ` +
    `${(Buffer.byteLength(file.csv) / 2 ** 20).toFixed(1)} MB, built in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
);

// 1. Baseline: COPY of the same rows into a table with meter_readings' indexes and defaults.
async function copyBaseline() {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query('DROP TABLE IF EXISTS bench_import_copy');
    await client.query('CREATE TABLE bench_import_copy (LIKE meter_readings INCLUDING ALL)');
    const chunks = function* () {
      for (let i = 0; i < file.copyRows.length; i += 5_000)
        yield file.copyRows.slice(i, i + 5_000).join('');
    };
    const t = performance.now();
    await copyText(
      client,
      `COPY bench_import_copy (organization_id, machine_id, value, lifetime_value, taken_at,
         source, entered_by, import_key) FROM STDIN`,
      chunks(),
    );
    const ms = performance.now() - t;
    await client.query('DROP TABLE bench_import_copy');
    return ms;
  } finally {
    await client.end();
  }
}
const copyMs = await copyBaseline();
const copyRate = (file.rows / copyMs) * 1000;

// 2. The API as its own process: preview, then commit, of the same file.
const api = await serveApi(APP_PORT);
try {
  const cookie = await signIn(api.origin, IMPORT_EMAIL, IMPORT_PASSWORD);
  const post = async (step: 'preview' | 'commit', csv: string) => {
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'readings.csv');
    const t = performance.now();
    const res = await fetch(
      `${api.origin}/api/v1/organizations/${farm.orgId}/readings/import/${step}`,
      { method: 'POST', headers: { cookie }, body: form },
    );
    const body = await res.text();
    const ms = performance.now() - t;
    if (!res.ok) throw new Error(`${step} answered ${res.status}: ${body.slice(0, 400)}`);
    return { ms, body: JSON.parse(body) as { data: Record<string, unknown> } };
  };
  // One small file first, so module loading and the first plans are not counted as the import's.
  const warm = file.csv.split('\n').slice(0, 11).join('\n');
  await post('preview', warm);
  const before = memoryMb(api.child.pid!);
  const readingsBefore = await readingCount();

  const preview = await post('preview', file.csv);
  const commit = await post('commit', file.csv);
  const after = memoryMb(api.child.pid!);
  // What the process gives back once idle (V8 shrinks its heap after a quiet spell), for the log.
  await new Promise((r) => setTimeout(r, 10_000));
  const settled = memoryMb(api.child.pid!);
  const added = (await readingCount()) - readingsBefore;
  console.log(
    `preview ${(preview.ms / 1000).toFixed(1)} s, commit ${(commit.ms / 1000).toFixed(1)} s ` +
      `(${JSON.stringify(commit.body.data)}); ${added.toLocaleString('en-US')} readings added; ` +
      `COPY ${(copyMs / 1000).toFixed(2)} s; API RSS ${before.rss.toFixed(0)} MB before, ` +
      `${after.rss.toFixed(0)} MB right after, ${settled.rss.toFixed(0)} MB 10 s later`,
  );
  if (added !== file.rows) throw new Error(`expected ${file.rows} readings added, found ${added}`);

  const importRate = (file.rows / commit.ms) * 1000;
  report({
    name: `reading CSV import, ${rowsText} rows`,
    value: importRate,
    unit: 'rows/s',
    baseline: { what: 'COPY of the same rows, same indexes', value: copyRate },
    target: '≥ 0.2×',
    met: importRate >= 0.2 * copyRate,
  });
  report({
    name: `reading CSV check (preview), ${rowsText} rows`,
    value: (file.rows / preview.ms) * 1000,
    unit: 'rows/s',
    baseline: { what: 'COPY of the same rows, same indexes', value: copyRate },
  });
  report({
    name: `API RSS after the ${rowsText}-row import`,
    value: after.rss,
    unit: 'MB',
    baseline: { what: 'RSS before it', value: before.rss },
    target: '≤ +100 MB',
    met: after.rss - before.rss <= 100,
  });
  report({
    name: `API peak RSS (VmHWM) through the ${rowsText}-row preview and import`,
    value: after.hwm,
    unit: 'MB',
    baseline: { what: 'RSS before them', value: before.rss },
  });
} finally {
  await api.stop();
  await sequelize.close();
}
