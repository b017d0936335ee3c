// A CPU profile of a piece of a benchmark (`--cpu-prof`): the V8 profiler through node:inspector,
// written as a .cpuprofile (open it in Chrome DevTools) and summarised as the functions with the
// most self time, so a part can say where its time goes without a second tool.
import { readFileSync, writeFileSync } from 'node:fs';
import { Session } from 'node:inspector/promises';
import path from 'node:path';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  hitCount?: number;
}

/** `sequelize`, `@date-fns/tz`, `server/services`, `(native)` … of a script URL. */
function packageOf(url: string): string {
  if (!url) return '(native, idle or GC)';
  const inModules = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (inModules) return inModules[1];
  if (url.startsWith('node:')) return 'node core';
  const inProject = /\/(server|shared|scripts|tests)\/(?:([^/]+)\/)?/.exec(url);
  return inProject ? [inProject[1], inProject[2]].filter(Boolean).join('/') : url;
}

/** Runs `fn` under the profiler; writes `<file>` and prints the `top` functions by self time. */
export async function profiled<T>(file: string, fn: () => Promise<T>, top = 15): Promise<T> {
  const session = new Session();
  session.connect();
  await session.post('Profiler.enable');
  await session.post('Profiler.start');
  try {
    return await fn();
  } finally {
    const { profile } = await session.post('Profiler.stop');
    session.disconnect();
    writeFileSync(file, JSON.stringify(profile));
    console.log(`cpu profile written to ${file}`);
    printProfile(profile.nodes as ProfileNode[], top);
  }
}

/** Prints the self time of a .cpuprofile (e.g. one `node --cpu-prof` wrote) by package and function. */
export function printProfileFile(file: string, top = 15) {
  printProfile((JSON.parse(readFileSync(file, 'utf8')) as { nodes: ProfileNode[] }).nodes, top);
}

function printProfile(nodes: ProfileNode[], top: number) {
  const total = nodes.reduce((n, p) => n + (p.hitCount ?? 0), 0) || 1;
  const bySite = new Map<string, number>();
  const byPackage = new Map<string, number>();
  for (const p of nodes) {
    const { functionName, url, lineNumber } = p.callFrame;
    const where = url ? `${path.basename(url)}:${lineNumber + 1}` : '(native)';
    const site = `${functionName || '(anonymous)'} ${where}`;
    bySite.set(site, (bySite.get(site) ?? 0) + (p.hitCount ?? 0));
    const pkg = packageOf(url);
    byPackage.set(pkg, (byPackage.get(pkg) ?? 0) + (p.hitCount ?? 0));
  }
  const print = (title: string, counts: Map<string, number>, n: number) => {
    console.log(title);
    for (const [key, hits] of [...counts].sort((a, b) => b[1] - a[1]).slice(0, n)) {
      console.log(`  ${((100 * hits) / total).toFixed(1).padStart(5)} %  ${key}`);
    }
  };
  print('self time by package or folder:', byPackage, 12);
  print('self time by function:', bySite, top);
}
