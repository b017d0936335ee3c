// No 500 for any input: every write route in the OpenAPI document gets generated bad bodies
// (tests/support/fuzz-arbitraries.ts) against a fully populated farm. Each answer is below 500,
// never the database's out_of_range safety net (the schema must refuse first), and a refusal
// changes no table. `npm run fuzz` runs 1,000 bodies per route; here 50.
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createApp } from '../../server/app';
import { bodyArbitrary } from '../support/fuzz-arbitraries';
import { fuzzHints, RouteFuzzer, routeName, writeRoutes } from '../support/fuzz-routes';
import { restoreDatabase, snapshotDatabase, type DatabaseSnapshot } from '../support/db-snapshot';
import { buildPopulatedWorld, type PopulatedWorld } from '../support/populated-world';

const app = createApp();
const BODIES_PER_ROUTE = 50;
const { routes } = writeRoutes();
const fuzzer = new RouteFuzzer(app);

describe('fuzz — generated bad bodies for every write route', () => {
  // one world, put back before each route so no route sees what another one wrote
  let world: PopulatedWorld;
  let snapshot: DatabaseSnapshot;
  beforeAll(async () => {
    world = await buildPopulatedWorld(app);
    snapshot = await snapshotDatabase();
  });

  it('write routes — read from the OpenAPI document (the fuzz covers a new route by itself)', () => {
    expect(routes.length).toBeGreaterThan(30);
    expect(routes.map(routeName)).toContain('PATCH /organizations/{orgId}/machines/{machineId}');
  });

  it.each(routes.map((r) => [routeName(r), r] as const))(
    '%s — no 5xx, and a refusal writes nothing',
    async (_name, route) => {
      await restoreDatabase(snapshot);
      fuzzer.forget();
      const hints = fuzzHints(world);
      await fc.assert(
        fc.asyncProperty(bodyArbitrary(route.schema, hints), async (body) => {
          const sent = await fuzzer.send(route, world, body);
          expect(sent.status, `answered ${sent.status} ${sent.code}`).toBeLessThan(500);
          expect(sent.code).not.toBe('out_of_range');
          if (sent.status >= 400) expect(sent.changed).toEqual([]);
        }),
        { numRuns: BODIES_PER_ROUTE, endOnFailure: true },
      );
    },
    120_000,
  );
});
