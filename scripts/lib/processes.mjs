// Child processes for the scripts: one-shot commands, long-running services with prefixed output,
// and readiness checks. Node built-ins only (see setup.mjs).
import { spawn } from 'node:child_process';
import net from 'node:net';
import { projectRoot, sleep, warn } from './common.mjs';

/** Runs a command to completion with inherited output; resolves to its exit code. */
export function runCommand(cmd, args, { env = process.env, cwd = projectRoot } = {}) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd, env, stdio: ['ignore', 'inherit', 'inherit'] });
    child.on('error', (error) => {
      warn(`could not run ${cmd}: ${error.message}`);
      resolve(127);
    });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 128 : 1)));
  });
}

/** Copies a stream to `out` line by line, each line starting with `[name] `. */
function prefixLines(stream, out, name) {
  let pending = '';
  stream.setEncoding('utf8');
  stream.on('data', (chunk) => {
    const lines = (pending + chunk).split('\n');
    pending = lines.pop() ?? '';
    for (const line of lines) out.write(`[${name}] ${line}\n`);
  });
  stream.on('end', () => {
    if (pending) out.write(`[${name}] ${pending}\n`);
  });
}

/**
 * Starts a long-running child in its own process group (detached), so that stopping it reaches
 * everything it started (tsx and the node process under it, vite's workers).
 * onExit(code, signal) is called if it ends before stop() was asked for.
 */
export function startService(
  name,
  cmd,
  args,
  { env = process.env, cwd = projectRoot, onExit } = {},
) {
  const child = spawn(cmd, args, { cwd, env, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
  prefixLines(child.stdout, process.stdout, name);
  prefixLines(child.stderr, process.stderr, name);
  let stopping = false;
  let exited = false;
  const exitPromise = new Promise((resolve) => {
    child.on('error', (error) => {
      warn(`[${name}] could not start ${cmd}: ${error.message}`);
      exited = true;
      resolve();
      if (!stopping) onExit?.(127, null);
    });
    child.on('exit', (code, signal) => {
      exited = true;
      resolve();
      if (!stopping) onExit?.(code, signal);
    });
  });

  const signalGroup = (signal) => {
    try {
      process.kill(-child.pid, signal);
    } catch {
      // The group is already gone.
    }
  };

  return {
    name,
    child,
    get exited() {
      return exited;
    },
    exitPromise,
    /** Sends SIGTERM to the group, then SIGKILL if it has not ended after `graceMs`. */
    async stop(graceMs = 5000) {
      stopping = true;
      if (child.pid === undefined) return;
      if (!exited) {
        signalGroup('SIGTERM');
        const timedOut = await Promise.race([
          exitPromise.then(() => false),
          sleep(graceMs).then(() => true),
        ]);
        if (timedOut) {
          warn(`[${name}] did not stop within ${graceMs} ms; killing it`);
          signalGroup('SIGKILL');
          await exitPromise;
        }
      }
      // Grandchildren may outlive the leader; make sure none is left behind.
      signalGroup('SIGKILL');
    },
  };
}

/**
 * Waits until `url` answers with `status` (200 by default). Gives up after `timeoutMs`, or at once
 * when `service` (from startService) has exited.
 */
export async function waitForHttp(url, { timeoutMs = 60000, service, status = 200 } = {}) {
  const deadline = Date.now() + timeoutMs;
  let lastProblem = 'no answer';
  while (Date.now() < deadline) {
    if (service?.exited) throw new Error(`${service.name} exited before ${url} answered`);
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(2000) });
      await response.arrayBuffer();
      if (response.status === status) return;
      lastProblem = `status ${response.status}`;
    } catch (error) {
      lastProblem = error.cause?.code ?? error.message;
    }
    await sleep(250);
  }
  throw new Error(`${url} did not answer ${status} within ${timeoutMs} ms (${lastProblem})`);
}

/** True when something accepts TCP connections on 127.0.0.1:port. */
export function isPortInUse(port) {
  return new Promise((resolve) => {
    const socket = net.connect({ host: '127.0.0.1', port });
    socket.setTimeout(1000);
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('timeout', () => {
      socket.destroy();
      resolve(false);
    });
    socket.once('error', () => resolve(false));
  });
}

/** Fails with a clear message when a port the script needs is taken by something else. */
export async function assertPortsFree(ports) {
  for (const [what, port] of Object.entries(ports)) {
    if (await isPortInUse(Number(port))) {
      throw new Error(
        `port ${port} (${what}) is already in use on 127.0.0.1; stop whatever holds it ` +
          `(another npm start or npm test?) or choose another port`,
      );
    }
  }
}

/** Stops services in reverse start order, never throwing. */
export async function stopAll(services) {
  for (const service of [...services].reverse()) {
    try {
      await service.stop();
    } catch (error) {
      warn(`[${service.name}] stopping failed: ${error.message}`);
    }
  }
  services.length = 0;
}
