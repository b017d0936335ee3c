// Pieces of the reading-post benchmark that run servers and drive them: a server started as its own
// Node process on loopback (so the load generator never shares its event loop), its CPU time read
// from /proc, one timed HTTP post, and an autocannon load of posts spread over machines.
import { spawn, type ChildProcess } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';

export interface Served {
  child: ChildProcess;
  origin: string;
  stop(): Promise<void>;
}

/**
 * Starts `node [nodeArgs] --import tsx <script> …args` with `env`, and waits until `healthPath`
 * answers 200.
 */
export async function serve(
  script: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  port: number,
  healthPath: string,
  nodeArgs: string[] = [],
): Promise<Served> {
  const child = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', script, ...args], {
    env,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const origin = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`${script} exited (${child.exitCode})`);
    const ok = await fetch(`${origin}${healthPath}`)
      .then((r) => r.ok)
      .catch(() => false);
    if (ok) break;
    if (Date.now() > deadline) throw new Error(`${script} did not answer on ${origin}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  return { child, origin, stop };
}

/** User + system CPU time a process has used so far, in ms (Linux /proc; clock ticks of 10 ms). */
export function cpuMs(pid: number): number {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  // fields after the command name (which may hold spaces) start at field 3
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

/** CPU time (ms) so far of every process in a process group (a service started detached). */
export function groupCpuMs(pgid: number): number {
  let total = 0;
  for (const pid of pids()) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      if (Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[2]) === pgid) total += cpuMs(pid);
    } catch {
      // ended while being read
    }
  }
  return total;
}

const parentOf = (pid: number) => {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
};

const pids = () =>
  readdirSync('/proc')
    .filter((e) => /^\d+$/.test(e))
    .map(Number);

/** The postmaster listening on `port`: found by the postmaster.pid file in its data folder. */
export function postmasterOn(port: number): number | null {
  for (const pid of pids()) {
    try {
      const args = readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0');
      const dir = args[args.indexOf('-D') + 1];
      if (!args[0].endsWith('/postgres') || !args.includes('-D') || !dir) continue;
      const lines = readFileSync(`${dir}/postmaster.pid`, 'utf8').split('\n');
      if (Number(lines[0]) === pid && Number(lines[3]) === port) return pid;
    } catch {
      // ended, or not ours to read
    }
  }
  return null;
}

/** CPU time (ms) so far of a PostgreSQL server's processes: its postmaster and its children. */
export function databaseCpu(postmaster: number): Map<number, number> {
  const byPid = new Map([[postmaster, cpuMs(postmaster)]]);
  for (const pid of pids()) {
    try {
      if (parentOf(pid) === postmaster) byPid.set(pid, cpuMs(pid));
    } catch {
      // the process ended while being read
    }
  }
  return byPid;
}

/**
 * CPU time (ms) a server's processes used between two readings: processes started meanwhile count
 * from zero; one that ended meanwhile (an idle pooled connection closing) is left out, not
 * subtracted.
 */
export function databaseCpuSince(postmaster: number, before: Map<number, number>): number {
  let total = 0;
  for (const [pid, ms] of databaseCpu(postmaster)) total += ms - (before.get(pid) ?? 0);
  return total;
}

export interface PostTarget {
  origin: string;
  /** path of the post for one machine */
  path: (machineId: string) => string;
  headers: Record<string, string>;
}

/** One post of `{ value }` to a machine; its wall time in ms (throws unless 201). */
export async function timedPost(target: PostTarget, machineId: string, value: number) {
  const t = performance.now();
  const res = await fetch(`${target.origin}${target.path(machineId)}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...target.headers },
    body: JSON.stringify({ value }),
  });
  const body = await res.text();
  const ms = performance.now() - t;
  if (res.status !== 201) throw new Error(`post answered ${res.status}: ${body.slice(0, 300)}`);
  return ms;
}

/**
 * Posts readings for `seconds` over `connections` keep-alive connections, each request to the next
 * machine in turn with that machine's current value (a repeat value taken now is a valid reading).
 */
export async function loadPosts(
  target: PostTarget,
  machines: { id: string; value: number }[],
  connections: number,
  seconds: number,
) {
  return loadPostsOver([target], machines, connections, seconds);
}

/**
 * The same load spread over several servers at once (as a load balancer with keep-alive spreads
 * it): the connections are dealt round-robin to the targets and the machines taken in one turn
 * across all of them. Rates and counts are summed; p50 is the slowest target's.
 */
export async function loadPostsOver(
  targets: PostTarget[],
  machines: { id: string; value: number }[],
  connections: number,
  seconds: number,
) {
  let next = 0;
  const runs = targets.map((target, t) => {
    const share =
      Math.floor(connections / targets.length) + (t < connections % targets.length ? 1 : 0);
    return autocannon({
      url: target.origin,
      connections: share,
      duration: seconds,
      headers: { 'content-type': 'application/json', ...target.headers },
      requests: [
        {
          method: 'POST',
          setupRequest: (req) => {
            const m = machines[next++ % machines.length];
            return { ...req, path: target.path(m.id), body: JSON.stringify({ value: m.value }) };
          },
        },
      ],
    });
  });
  const results = await Promise.all(runs);
  const sum = (f: (r: (typeof results)[number]) => number) => results.reduce((a, r) => a + f(r), 0);
  return {
    reqPerSec: sum((r) => r.requests.average),
    total: sum((r) => r.requests.total),
    non2xx: sum((r) => r.non2xx),
    errors: sum((r) => r.errors),
    timeouts: sum((r) => r.timeouts),
    p50: Math.max(...results.map((r) => r.latency.p50)),
    /** requests each target answered */
    perTarget: results.map((r) => r.requests.total),
  };
}
