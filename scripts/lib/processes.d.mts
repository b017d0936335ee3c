// Types of processes.mjs for the TypeScript scripts that use it.
import type { ChildProcess } from 'node:child_process';

export interface Service {
  name: string;
  child: ChildProcess;
  readonly exited: boolean;
  exitPromise: Promise<void>;
  stop(graceMs?: number): Promise<void>;
}

export function runCommand(
  cmd: string,
  args: string[],
  options?: { env?: NodeJS.ProcessEnv; cwd?: string },
): Promise<number>;
export function startService(
  name: string,
  cmd: string,
  args: string[],
  options?: {
    env?: NodeJS.ProcessEnv;
    cwd?: string;
    onExit?: (code: number | null, signal: NodeJS.Signals | null) => void;
  },
): Service;
export function waitForHttp(
  url: string,
  options?: { timeoutMs?: number; service?: Service; status?: number },
): Promise<void>;
export function isPortInUse(port: number): Promise<boolean>;
export function assertPortsFree(ports: Record<string, number>): Promise<void>;
export function stopAll(services: Service[]): Promise<void>;
