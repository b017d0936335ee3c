// Types of app.mjs for the TypeScript scripts that use it.
import type { Service } from './processes.mjs';

type OnExit = (code: number | null, signal: NodeJS.Signals | null) => void;

export const tsx: string;
export function jwtSecret(): string;
/** Newest modification time (ms) of a file, or of any file below a folder. */
export function newestMtime(target: string): number;
/** What a client build is made from, relative to the project. */
export const CLIENT_INPUTS: string[];
export function runTsScript(script: string, args: string[], env: NodeJS.ProcessEnv): Promise<void>;
export function startMailCatcher(options: {
  smtpPort: number;
  httpPort: number;
  services: Service[];
  onExit?: OnExit;
}): Promise<{ smtpUrl: string; catcherUrl: string }>;
export function startFakeS3(options: {
  port: number;
  directory: string;
  services: Service[];
  onExit?: OnExit;
}): Promise<Record<string, string>>;
export function startApi(options: {
  env: NodeJS.ProcessEnv;
  port: number;
  watch?: boolean;
  services: Service[];
  onExit?: OnExit;
}): Promise<void>;
