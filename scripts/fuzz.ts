// Fuzz of every write route (run by `npm run fuzz`, which prepares the database): generated bad
// bodies (tests/support/fuzz-arbitraries.ts) against a fully populated farm, put back before each
// route. Prints a table per route and the totals; exits 1 on any 5xx, on a value that reached
// the database's out_of_range safety net, or on a refusal that wrote a row.
//   --bodies=N (default 1000)   --route=TEXT (only routes whose path contains it)   --seed=N
import fc from 'fast-check';
import { sequelize } from '../server/db';
import { createApp } from '../server/app';
import { bodyArbitrary } from '../tests/support/fuzz-arbitraries';
import {
  fuzzHints,
  RouteFuzzer,
  routeName,
  writeRoutes,
  type SentBody,
} from '../tests/support/fuzz-routes';
import { restoreDatabase, snapshotDatabase } from '../tests/support/db-snapshot';
import { buildPopulatedWorld } from '../tests/support/populated-world';

const arg = (name: string) => process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1];
const BODIES = Number(arg('bodies') ?? 1000);
const ONLY = arg('route');
const SEED = arg('seed') === undefined ? Date.now() % 2 ** 31 : Number(arg('seed'));

interface Counts {
  bodies: number;
  ok: number;
  refused: number;
  serverErrors: number;
  /** refused by the database's out_of_range safety net: the schema let the value through */
  safetyNet: number;
  wroteOnRefusal: number;
}
interface Tally extends Counts {
  name: string;
  examples: string[];
  /** refusals by status, code and first field named */
  reasons: Map<string, number>;
}

const app = createApp();
const { routes, skipped } = writeRoutes();
const chosen = routes.filter((r) => !ONLY || r.path.includes(ONLY));
const fuzzer = new RouteFuzzer(app);
const world = await buildPopulatedWorld(app);
const snapshot = await snapshotDatabase();
const hints = fuzzHints(world);
const tallies: Tally[] = [];

/** Counts one answer; returns what was wrong with it (empty when nothing). */
function tally(t: Tally, sent: SentBody): string[] {
  const problems: string[] = [];
  t.bodies += 1;
  if (sent.status >= 500) {
    t.serverErrors += 1;
    problems.push(`${sent.status}`);
  } else if (sent.status >= 400) {
    t.refused += 1;
    const [field] = Object.keys(sent.fields);
    const reason = `${sent.status} ${sent.code ?? '-'}${field ? ` ${field}` : ''}`;
    t.reasons.set(reason, (t.reasons.get(reason) ?? 0) + 1);
  } else t.ok += 1;
  if (sent.code === 'out_of_range') {
    t.safetyNet += 1;
    problems.push('out_of_range');
  }
  if (sent.status >= 400 && sent.changed.length) {
    t.wroteOnRefusal += 1;
    problems.push(`${sent.status} wrote ${sent.changed.join(', ')}`);
  }
  return problems;
}

console.log(`fuzz: ${chosen.length} write routes × ${BODIES} bodies, seed ${SEED}`);
for (const [index, route] of chosen.entries()) {
  await restoreDatabase(snapshot);
  fuzzer.forget();
  const t: Tally = {
    name: routeName(route),
    ...{ bodies: 0, ok: 0, refused: 0, serverErrors: 0, safetyNet: 0, wroteOnRefusal: 0 },
    examples: [],
    reasons: new Map(),
  };
  const bodies = fc.sample(bodyArbitrary(route.schema, hints), {
    numRuns: BODIES,
    seed: SEED + index,
  });
  for (const body of bodies) {
    const problems = tally(t, await fuzzer.send(route, world, body));
    if (problems.length && t.examples.length < 3)
      t.examples.push(`${problems.join('; ')}: ${JSON.stringify(body).slice(0, 300)}`);
  }
  tallies.push(t);
  const top = [...t.reasons]
    .sort((a, b) => b[1] - a[1])
    .slice(0, 3)
    .map(([r, n]) => `${r} ×${n}`)
    .join(', ');
  console.log(`${t.name.padEnd(72)} ${String(t.ok).padStart(5)} ok  (most refused: ${top})`);
}

const COLUMNS: [keyof Counts, string][] = [
  ['bodies', 'bodies'],
  ['ok', '2xx'],
  ['refused', '4xx'],
  ['serverErrors', '5xx'],
  ['safetyNet', 'safety net'],
  ['wroteOnRefusal', 'wrote on 4xx'],
];
const total = Object.fromEntries(
  COLUMNS.map(([k]) => [k, tallies.reduce((n, t) => n + t[k], 0)]),
) as unknown as Counts;
// each column as wide as its header or the total (the largest figure), plus two spaces
const width = (k: keyof Counts, h: string) => Math.max(h.length, String(total[k]).length) + 2;
const row = (name: string, c: Counts) =>
  `${name.padEnd(72)}${COLUMNS.map(([k, h]) => String(c[k]).padStart(width(k, h))).join('')}`;
console.log(`\n${'route'.padEnd(72)}${COLUMNS.map(([k, h]) => h.padStart(width(k, h))).join('')}`);
for (const t of tallies) console.log(row(t.name, t));
console.log(row('total', total));
for (const t of tallies) for (const e of t.examples) console.log(`  ${t.name}: ${e}`);
if (skipped.length) console.log(`\nnot fuzzed (no JSON body): ${skipped.join('; ')}`);
await sequelize.close();
const failed = total.serverErrors + total.safetyNet + total.wroteOnRefusal;
console.log(
  failed
    ? `\nfuzz: FAILED (${failed} answers)`
    : '\nfuzz: passed (no 5xx, no value past the schema, nothing written on refusal)',
);
process.exit(failed ? 1 : 0);
