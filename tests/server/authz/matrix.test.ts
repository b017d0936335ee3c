// The authorization matrix (issue 16): every route of the OpenAPI document × every caller × the
// farm's own ids and another organization's, each a real request, against the table of expected
// answers in expected.ts. A refused request must leave every tenant table as it was, and no answer
// to a dealer may name one of the farm's defects. A route added later without a row in the table
// fails the first test.
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { resetDatabase } from '../../support/db';
import { Defect } from '../../../server/models';
import { CALLERS, CALLER_WORDS, isDealer, type Answer, type Caller, type Side } from './callers';
import { EXPECTED, routeOf } from './expected';
import { FLEET_CASES, type Case, type Ctx } from './cases-fleet';
import { WORK_CASES } from './cases-work';
import { ORG_CASES } from './cases-org';
import { DEALER_CASES } from './cases-dealers';
import { ACCOUNT_CASES } from './cases-account';
import { KEY_CASES } from './cases-keys';
import { METER_CASES } from './cases-meters';
import { HITCH_CASES } from './cases-hitch';
import { SEASON_CASES } from './cases-seasons';
import {
  app,
  changedTables,
  clearSignInCounters,
  fill,
  foreignAnswers,
  matches,
  send,
  sideWords,
  tenantChecksum,
  writeMark,
} from './harness';
import { seedWorld, type World } from './world';

const CASES: Record<string, Case> = {
  ...FLEET_CASES,
  ...WORK_CASES,
  ...ORG_CASES,
  ...DEALER_CASES,
  ...ACCOUNT_CASES,
  ...KEY_CASES,
  ...METER_CASES,
  ...HITCH_CASES,
  ...SEASON_CASES,
};

async function documentedRoutes(): Promise<string[]> {
  const res = await request(app).get('/api/v1/openapi.json');
  const paths = res.body.paths as Record<string, Record<string, unknown>>;
  return Object.entries(paths).flatMap(([path, ops]) =>
    Object.keys(ops).map((method) => `${method.toUpperCase()} ${path}`),
  );
}

let known = { mark: '', sums: '' };
/** The tenant tables' fingerprint, taken again only when something was written since the last. */
async function fingerprint() {
  const mark = await writeMark();
  if (mark !== known.mark) known = { mark, sums: await tenantChecksum() };
  return known;
}

/** The ids and titles of the farm's defects, which no answer to a dealer may carry (issue 16). */
async function defectNames(w: World): Promise<string[]> {
  const rows = await Defect.findAll({
    where: { organizationId: w.farm.org.id },
    attributes: ['id', 'title'],
  });
  return [...new Set(rows.flatMap((d) => [d.id, d.title]))];
}

/** One cell: the request, its answer against the table, and on a refusal the rows unchanged. */
async function runCell(w: World, key: string, caller: Caller, side: Side): Promise<string[]> {
  const spec = CASES[key];
  const own: Answer = EXPECTED[key][caller];
  const allowed = side === 'own' ? [own] : foreignAnswers(own, spec.ids);
  const ctx: Ctx = {
    w,
    caller,
    side,
    rec: side === 'own' ? w.farm : w.other,
    succeeds: side === 'own' && own === '2xx',
    cookie: w.cookies[caller],
  };
  const built = await spec.build(ctx);
  const [method, path] = routeOf(key).split(' ');
  const before = await fingerprint();
  const res = await send(method, ctx.cookie, { ...built, path: fill(path, built.params) });
  if (spec.undo && res.status < 300) await spec.undo(ctx, res.body);
  const cell = `${CALLER_WORDS[caller]}, ${sideWords(side)}`;
  const problems: string[] = [];
  if (!allowed.some((a) => matches(res.status, a))) {
    const said = (res.body as { error?: { message?: string } } | undefined)?.error?.message;
    problems.push(
      `${cell}: expected ${allowed.join(' or ')}, got ${res.status}${said ? ` (${said})` : ''}`,
    );
  }
  if (isDealer(caller)) {
    const named = (await defectNames(w)).filter((name) => res.text?.includes(name));
    if (named.length)
      problems.push(`${cell}: the answer names the farm's defects ${named.join(', ')}`);
  }
  if (res.status >= 400) {
    const after = await fingerprint();
    if (after.sums !== before.sums)
      problems.push(
        `${cell}: refused with ${res.status} but changed ${changedTables(before.sums, after.sums).join(', ')}`,
      );
  }
  return problems;
}

describe('authorization matrix — every route × every caller × own and foreign ids', () => {
  let w: World;
  let documented: string[];

  beforeAll(async () => {
    await resetDatabase();
    w = await seedWorld();
    documented = await documentedRoutes();
  }, 120_000);

  it('the table — has a row and a request for every route of the OpenAPI document, and no row for a route it does not document', () => {
    const keys = Object.keys(EXPECTED);
    const missing = documented.filter((r) => !keys.some((k) => routeOf(k) === r));
    const stale = keys.filter((k) => !documented.includes(routeOf(k)));
    const unsent = keys.filter((k) => !CASES[k]);
    const unused = Object.keys(CASES).filter((k) => !EXPECTED[k]);
    expect(documented.length).toBeGreaterThan(100);
    expect({ missing, stale, unsent, unused }).toEqual({
      missing: [],
      stale: [],
      unsent: [],
      unused: [],
    });
  });

  it.each(Object.keys(EXPECTED).filter((k) => CASES[k]))(
    '%s — each caller, with own and foreign ids, gets the answer of the table; a refusal changes no row',
    async (key) => {
      await clearSignInCounters();
      const problems: string[] = [];
      for (const side of ['own', 'foreign'] as const) {
        if (side === 'foreign' && CASES[key].ids === 'none') continue;
        for (const caller of CALLERS) problems.push(...(await runCell(w, key, caller, side)));
      }
      expect(problems).toEqual([]);
    },
  );
});
