// Scenario (a): PostgreSQL restarts (pg_ctl restart -m fast) while readings are posted for 30 s.
// Acknowledged readings (201 "added") are compared with the rows stored afterwards.
import { spawn } from 'node:child_process';
import { openSync, closeSync } from 'node:fs';
import pg from 'pg';
import { ApiSession, tally, type Answer } from './http';

export interface RestartFigures {
  posts: number;
  acknowledged: number;
  stored: number;
  /** acknowledged but not stored: must be 0 */
  lost: number;
  /** stored although the answer was an error (the commit landed, the reply did not) */
  storedUnacknowledged: number;
  statuses: Record<string, number>;
  fiveHundreds: number;
  serverErrors500: number;
  restartSeconds: number;
  /** from the restart command until posts succeeded again */
  recoverySeconds: number;
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** pg_ctl restart -m fast, as the postgres user; the server's output goes to its log file. */
function restartPostgres(binDir: string, pgData: string, logFile: string): Promise<void> {
  const args = ['restart', '-D', pgData, '-m', 'fast', '-w', '-t', '60', '-s'];
  const [cmd, argv] = isRoot
    ? ['runuser', ['-u', 'postgres', '--', `${binDir}/pg_ctl`, ...args]]
    : [`${binDir}/pg_ctl`, args];
  // The restarted server inherits these descriptors: the log file, as `pg_ctl start -l` gives it.
  const log = openSync(logFile, 'a');
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, argv, { cwd: '/', stdio: ['ignore', log, log], detached: false });
    child.on('error', reject);
    child.on('exit', (code) => {
      closeSync(log);
      if (code === 0) resolve();
      else reject(new Error(`pg_ctl restart failed (exit ${code}); see ${logFile}`));
    });
  });
}

export async function postgresRestartUnderLoad(options: {
  session: ApiSession;
  orgId: string;
  databaseUrl: string;
  binDir: string;
  pgData: string;
  logFile: string;
  durationMs?: number;
  restartAtMs?: number;
  writers?: number;
}): Promise<RestartFigures> {
  const { session, orgId, durationMs = 30_000, restartAtMs = 10_000, writers = 4 } = options;
  const MAX_POSTS_PER_WRITER = 3000;
  // One machine per writer, so each writer's readings only ever follow its own.
  const machineIds: string[] = [];
  for (let w = 0; w < writers; w++) {
    const made = await session.request('POST', `/organizations/${orgId}/machines`, {
      fleetNumber: `REL-${w + 1}`,
      name: `Reliability check machine ${w + 1}`,
      category: 'tractor',
    });
    if (made.status !== 201)
      throw new Error(`creating a machine failed: ${made.status} ${JSON.stringify(made.body)}`);
    machineIds.push((made.body as { data: { id: string } }).data.id);
  }

  const started = performance.now();
  // Readings 30 minutes apart (+0.25 h: 12 h a day, within the rules), from 70 days ago.
  const base = Date.now() - 70 * 86_400_000;
  const answers: (Answer & { at: number })[] = [];
  const acknowledgedIds = new Set<string>();

  async function writer(machineId: string) {
    for (let n = 0; n < MAX_POSTS_PER_WRITER && performance.now() - started < durationMs; n++) {
      const at = performance.now() - started;
      const answer = await session.request(
        'POST',
        `/organizations/${orgId}/machines/${machineId}/readings`,
        {
          value: 100 + n * 0.25,
          takenAt: new Date(base + n * 30 * 60_000).toISOString(),
        },
      );
      answers.push({ ...answer, at });
      const body = answer.body as { status?: string; data?: { id: string } } | null;
      if (answer.status === 201 && body?.status === 'added' && body.data)
        acknowledgedIds.add(body.data.id);
    }
  }

  let restartStart = 0;
  let restartEnd = 0;
  const restart = (async () => {
    await new Promise((resolve) => setTimeout(resolve, restartAtMs));
    restartStart = performance.now() - started;
    await restartPostgres(options.binDir, options.pgData, options.logFile);
    restartEnd = performance.now() - started;
  })();
  await Promise.all([...machineIds.map(writer), restart]);

  const client = new pg.Client({ connectionString: options.databaseUrl });
  await client.connect();
  const { rows } = await client.query<{ id: string }>(
    'SELECT id FROM meter_readings WHERE machine_id = ANY($1::uuid[])',
    [machineIds],
  );
  await client.end();
  const storedIds = new Set(rows.map((r) => r.id));

  const failures = answers.filter((a) => a.status !== 201);
  const lastFailureAt = failures.length ? Math.max(...failures.map((a) => a.at)) : restartStart;
  const recovered = answers.filter((a) => a.status === 201 && a.at > lastFailureAt);
  const recoveredAt = recovered.length
    ? Math.min(...recovered.map((a) => a.at + a.ms))
    : Number.NaN;
  return {
    posts: answers.length,
    acknowledged: acknowledgedIds.size,
    stored: storedIds.size,
    lost: [...acknowledgedIds].filter((id) => !storedIds.has(id)).length,
    storedUnacknowledged: [...storedIds].filter((id) => !acknowledgedIds.has(id)).length,
    statuses: tally(answers),
    fiveHundreds: answers.filter((a) => a.status >= 500).length,
    serverErrors500: answers.filter((a) => a.status === 500).length,
    restartSeconds: (restartEnd - restartStart) / 1000,
    recoverySeconds: failures.length ? Math.max(0, recoveredAt - restartStart) / 1000 : 0,
  };
}
