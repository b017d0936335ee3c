// The bodies that used to answer 500 (issue 16's fuzz: numbers past their columns, NUL in text,
// the year 0000, a day that does not exist): each is now a 400 naming the field and the rule,
// and no table changes. A value that still reached PostgreSQL would answer 400 out_of_range.
import { beforeAll, describe, expect, it } from 'vitest';
import { DatabaseError } from 'sequelize';
import { createApp } from '../../server/app';
import { isInputRangeError } from '../../server/middlewares/input-range-error';
import { RouteFuzzer, writeRoutes } from '../support/fuzz-routes';
import { buildPopulatedWorld, type PopulatedWorld } from '../support/populated-world';

const app = createApp();
const fuzzer = new RouteFuzzer(app);
const { routes } = writeRoutes();
const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
const plan = { status: 'planned', plannedFor: inDays(30) };

const CASES: [string, string, (w: PopulatedWorld) => object, string, RegExp][] = [
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/tasks',
    () => ({ name: 'Overhaul', intervalMeter: 5000, labourHours: 10_001 }),
    'labourHours',
    /^Estimated labour must be at most 1,000$/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/tasks',
    () => ({ name: 'Overhaul', intervalMeter: 1e15 }),
    'intervalMeter',
    /^Meter interval must be at most 1,000,000$/,
  ],
  [
    'patch',
    '/organizations/{orgId}/tasks/{taskId}',
    () => ({ intervalDays: 2 ** 31 }),
    'intervalDays',
    /^Day interval must be at most 7,300$/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/service-records',
    () => ({ ...plan, measurements: [{ name: 'Pressure', value: 3, specMin: 1e308 }] }),
    'measurements.0.specMin',
    /^Spec minimum must be at most 1,000,000$/,
  ],
  [
    'patch',
    '/organizations/{orgId}/machines/{machineId}',
    () => ({ notes: 'Front weights\u0000 in the shed' }),
    'notes',
    /^Remove control characters/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/readings',
    () => ({ value: 4400, takenAt: '0000-01-01T00:00:00Z' }),
    'takenAt',
    /^Time taken may not be before 1950-01-01 nor in the future$/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/readings',
    () => ({ value: 4400, takenAt: '1949-06-01T08:00:00-06:00' }),
    'takenAt',
    /^Time taken may not be before 1950-01-01 nor in the future$/,
  ],
  [
    'put',
    '/organizations/{orgId}/tasks/{taskId}/last-done',
    () => ({ lastDoneMeter: 4000, lastDoneOn: '0000-01-01' }),
    'lastDoneOn',
    /^Date may not be before 1950-01-01 nor in the future$/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines/{machineId}/service-records',
    () => ({ ...plan, plannedFor: '2026-02-30' }),
    'plannedFor',
    /^Planned for must be a real date, yyyy-mm-dd$/,
  ],
  [
    'post',
    '/organizations/{orgId}/bookings',
    (w) => ({
      customerId: w.farmId,
      proposedFor: inDays(3650),
      items: [{ machineId: w.ids.machineId, taskIds: [] }],
    }),
    'proposedFor',
    /^Proposed date must be between \d{4}-\d\d-\d\d and \d{4}-\d\d-\d\d$/,
  ],
  [
    'post',
    '/organizations/{orgId}/machines',
    () => ({ fleetNumber: 'T-\t09', name: 'Spare tractor', category: 'tractor' }),
    'fleetNumber',
    /^Remove control characters/,
  ],
];

describe('input bounds — what used to be a 500 is a 400 naming the field and the rule', () => {
  let w: PopulatedWorld;
  beforeAll(async () => {
    w = await buildPopulatedWorld(app);
  });

  it.each(CASES)('%s %s — %s', async (method, path, body, field, rule) => {
    const route = routes.find((r) => r.method === method && r.path === path);
    if (!route) throw new Error(`no route ${method} ${path} in the OpenAPI document`);
    fuzzer.forget();
    const sent = await fuzzer.send(route, w, { json: body(w) });
    expect([sent.status, sent.code, Object.keys(sent.fields)]).toEqual([400, 'invalid', [field]]);
    expect(sent.fields[field]).toMatch(rule);
    expect(sent.changed).toEqual([]);
  });
});

describe('input-range safety net (error handler)', () => {
  it('a PostgreSQL data exception (22003, numeric out of range) counts as bad input; a lost connection does not', () => {
    const outOfRange = new DatabaseError(
      Object.assign(new Error('numeric field overflow'), { code: '22003', sql: '' }),
    );
    const nul = new DatabaseError(
      Object.assign(new Error('invalid byte sequence'), { code: '22021', sql: '' }),
    );
    const gone = new DatabaseError(
      Object.assign(new Error('terminating connection'), { code: '57P01', sql: '' }),
    );
    expect([
      isInputRangeError(outOfRange),
      isInputRangeError(nul),
      isInputRangeError(gone),
    ]).toEqual([true, true, false]);
    expect(isInputRangeError(new Error('numeric field overflow'))).toBe(false);
  });
});
