// Pieces of the reading-post benchmark that run servers and drive them: a server started as its own
// Node process on loopback (so the load generator never shares its event loop), its CPU time read
// from /proc, one timed HTTP post, and an autocannon load of posts spread over machines.
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';

export interface Served {
  child: ChildProcess;
  origin: string;
  stop(): Promise<void>;
}

/** Starts `node --import tsx <script> …args` with `env`, and waits until `healthPath` answers 200. */
export async function serve(
  script: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  port: number,
  healthPath: string,
): Promise<Served> {
  const child = spawn(process.execPath, ['--import', 'tsx', script, ...args], {
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
  let next = 0;
  const result = await autocannon({
    url: target.origin,
    connections,
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
  return {
    reqPerSec: result.requests.average,
    total: result.requests.total,
    non2xx: result.non2xx,
    errors: result.errors,
    p50: result.latency.p50,
  };
}
