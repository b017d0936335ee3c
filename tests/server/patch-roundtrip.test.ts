// Every PATCH route changes only the fields it is sent: from a fully populated world, a one-field
// update leaves every other column of the stored row (and of its child rows) exactly as it was.
// The routes come from the OpenAPI document, and each field of each update schema needs a case
// below, so a new PATCH route or field without one fails here.
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { todayIso } from '../../shared/domain';
import { buildPopulatedWorld, type PopulatedWorld } from '../support/populated-world';
import { patchPaths, snapshot, without, type PatchRoute } from './patch-roundtrip-rows';

const app = createApp();
const DAY = 86_400_000;
const daysFromToday = (n: number) => todayIso('America/Chicago', new Date(Date.now() + n * DAY));

const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const farm = (w: PopulatedWorld, rest: string) => `/api/v1/organizations/${w.farmId}${rest}`;
const v = (x: unknown) => () => x;

const ROUTES: Record<string, PatchRoute> = {
  '/organizations/{orgId}/machines/{machineId}': {
    table: 'machines',
    id: (w) => w.ids.machineId,
    url: (w) => farm(w, `/machines/${w.ids.machineId}`),
    children: [['machine_operators', 'machine_id']],
    cases: [
      { field: 'fleetNumber', value: v('T-08') },
      { field: 'name', value: v('Loader tractor') },
      { field: 'category', value: v('loader') },
      { field: 'make', value: v('Tamsin') },
      { field: 'model', value: v('TX 2') },
      { field: 'serialNumber', value: v('TM-2-0099') },
      { field: 'telematicsId', value: v('feed-0099') },
      { field: 'year', value: v(2019) },
      { field: 'purchasePriceMinor', value: v(17_000_000) },
      { field: 'listPriceMinor', value: v(null) },
      { field: 'meterUnit', value: v('h') },
      { field: 'seasonMonths', value: v([6, 7, 8]) },
      { field: 'operatorIds', value: v([]), children: ['machine_operators'] },
      { field: 'notes', value: v('Cab filter due.') },
      { field: 'status', value: v('sold') },
    ],
  },
  '/organizations/{orgId}/machines/{machineId}/spec-sheet': {
    table: 'machine_spec_sheets',
    idColumn: 'machine_id',
    id: (w) => w.ids.machineId,
    url: (w) => farm(w, `/machines/${w.ids.machineId}/spec-sheet`),
    cases: [
      { field: 'capacities', value: v({ coolant: { quantity: 28, unit: 'L' } }) },
      { field: 'filters', value: v({ cab: 'BR-CF-7' }) },
      { field: 'tyrePressures', value: v({ rear: { value: 140, unit: 'kPa' } }) },
      { field: 'notes', value: v('From the dealer.') },
      // the populated sheet's lists are emptied
      ...['extraCapacities', 'extraFilters', 'torques', 'testPressures'].map((field) => ({
        field,
        value: v([]),
      })),
    ],
  },
  '/organizations/{orgId}/tasks/{taskId}': {
    table: 'service_tasks',
    id: (w) => w.ids.taskId,
    url: (w) => farm(w, `/tasks/${w.ids.taskId}`),
    cases: [
      { field: 'name', value: v('Engine oil, filter and breather') },
      { field: 'intervalMeter', value: v(6000) },
      { field: 'intervalDays', value: v(null) },
      // a season service takes no day interval (cleared just above); anchor and days go together
      {
        field: 'seasonAnchor',
        value: v('before_start'),
        setup: () => ({ seasonAnchor: 'after_end', seasonOffsetDays: 14 }),
      },
      { field: 'seasonOffsetDays', value: v(21) },
      { field: 'firstServiceMeter', value: v(600) },
      { field: 'warnMeter', value: v(300) },
      { field: 'warnDays', value: v(30) },
      {
        field: 'parts',
        value: v([{ partNumber: 'OF-110', description: 'Oil filter, long', quantity: 1 }]),
      },
      { field: 'fluids', value: v([{ kind: 'Engine oil 10W-40', volume: 19, unit: 'L' }]) },
      { field: 'labourHours', value: v(2) },
      { field: 'instructions', value: v('Drain warm.') },
      { field: 'safetyNotes', value: v('Hot oil.') },
      { field: 'hazards', value: v(['hot_fluid', 'battery']) },
      { field: 'dailyCare', value: v(true) },
      // the task counted on the machine's PTO hours instead of its primary meter (issue 13)
      { field: 'meterId', value: (ids) => ids.meterId },
    ],
  },
  '/organizations/{orgId}/machines/{machineId}/meters/{meterId}': {
    table: 'machine_meters',
    id: (w) => w.ids.meterId,
    url: (w) => farm(w, `/machines/${w.ids.machineId}/meters/${w.ids.meterId}`),
    cases: [
      { field: 'label', value: v('Rear PTO') },
      { field: 'position', value: v(4) },
    ],
  },
  '/organizations/{orgId}/hitch-spans/{spanId}': {
    table: 'hitch_spans',
    id: (w) => w.ids.spanId,
    url: (w) => farm(w, `/hitch-spans/${w.ids.spanId}`),
    cases: [
      { field: 'note', value: v('Third cut.') },
      { field: 'endedAt', value: v(new Date(Date.now() - 11 * 86_400_000).toISOString()) },
      { field: 'startedAt', value: v(new Date(Date.now() - 16 * 86_400_000).toISOString()) },
      { field: 'meterKind', value: v('pto_hours') },
      { field: 'tractorId', value: (ids) => ids.spareTractorId },
    ],
  },
  '/organizations/{orgId}/service-records/{recordId}': {
    table: 'service_records',
    id: (w) => w.ids.recordId,
    url: (w) => farm(w, `/service-records/${w.ids.recordId}`),
    children: [['service_measurements', 'service_record_id']],
    cases: [
      { field: 'plannedFor', value: v(daysFromToday(10)) },
      { field: 'taskIds', value: (ids) => [ids.taskId, ids.otherTaskId], columns: ['tasks'] },
      { field: 'technicianIds', value: (ids) => [ids.managerUserId] },
      { field: 'labourHours', value: v(3) },
      {
        field: 'parts',
        value: v([{ partNumber: 'OF-110', quantity: 2, unitCostMinor: 1900 }]),
      },
      { field: 'fluids', value: v([]) },
      { field: 'otherCosts', value: v([{ description: 'Rags', amountMinor: 300 }]) },
      { field: 'notes', value: v('Long hose packed.') },
      {
        field: 'measurements',
        value: v([{ name: 'Oil pressure', value: 3.1, unit: 'bar' }]),
        children: ['service_measurements'],
      },
      {
        field: 'reassemblySettings',
        value: v([{ what: 'Belt tensioner', value: '3 turns out', restored: true }]),
      },
      { field: 'unrestoredReason', value: v('') },
      { field: 'closesDefectIds', value: v([]), columns: ['defect_ids'] },
    ],
  },
  '/organizations/{orgId}/defects/{defectId}': {
    table: 'defects',
    id: (w) => w.ids.defectId,
    url: (w) => farm(w, `/defects/${w.ids.defectId}`),
    cases: [
      { field: 'title', value: v('Left work light dead') },
      { field: 'description', value: v('Connector corroded.') },
      { field: 'severity', value: v('major') },
      { field: 'status', value: v('open') },
      { field: 'assignedTo', value: v(null) },
    ],
  },
  '/organizations/{orgId}/checklist-templates/{templateId}': {
    table: 'checklist_templates',
    id: (w) => w.ids.templateId,
    url: (w) => farm(w, `/checklist-templates/${w.ids.templateId}`),
    cases: [
      { field: 'category', value: v('loader') },
      { field: 'name', value: v('Loader daily check') },
      { field: 'description', value: v('Before work.') },
      {
        field: 'items',
        value: v([
          { id: 'oil', label: 'Engine oil level', guidance: '', critical: false, hazards: [] },
        ]),
      },
    ],
  },
  '/organizations/{orgId}/readings/{readingId}': {
    table: 'meter_readings',
    id: (w) => w.ids.readingId,
    url: (w) => farm(w, `/readings/${w.ids.readingId}`),
    cases: [
      // the lifetime value follows the value (no meter replacement here)
      { field: 'value', value: v(4300), columns: ['value', 'lifetime_value'] },
      { field: 'takenAt', value: () => new Date(Date.now() - 9 * DAY).toISOString() },
    ],
  },
  '/organizations/{orgId}/members/{id}': {
    table: 'memberships',
    id: (w) => w.ids.membershipId,
    url: (w) => farm(w, `/members/${w.ids.membershipId}`),
    cases: [{ field: 'role', value: v('operator') }],
  },
  '/organizations/{orgId}/reminder-settings': {
    table: 'organizations',
    id: (w) => w.farmId,
    url: (w) => farm(w, '/reminder-settings'),
    cases: [{ field: 'digestHour', value: v(9) }],
  },
  '/organizations/{orgId}/dealers/{linkId}': {
    table: 'dealer_links',
    id: (w) => w.ids.linkId,
    url: (w) => farm(w, `/dealers/${w.ids.linkId}`),
    cases: [{ field: 'access', value: v('view') }],
  },
  '/organizations/{orgId}': {
    table: 'organizations',
    id: (w) => w.farmId,
    url: (w) => farm(w, ''),
    cases: [
      { field: 'name', value: v('Ridgeback Farm North') },
      { field: 'timeZone', value: v('Europe/Dublin') },
      { field: 'currency', value: v('EUR') },
      { field: 'units', value: v('imperial') },
      { field: 'labourRateMinor', value: v(6200) },
      { field: 'seasonMonths', value: v([4, 5, 6]) },
      { field: 'digestHour', value: v(8) },
    ],
  },
  '/account': {
    table: 'users',
    id: (w) => w.ids.managerUserId,
    url: () => '/api/v1/account',
    cases: [{ field: 'name', value: v('Ridgeback Manager') }],
  },
};

describe('PATCH round-trip — a one-field update leaves every other stored column as it was', () => {
  let w: PopulatedWorld;
  beforeAll(async () => {
    w = await buildPopulatedWorld(app);
  });

  it('PATCH routes — every route in the OpenAPI document, and every field of its body, has a case', () => {
    const documented = patchPaths();
    expect(documented.map((d) => d.path).sort()).toEqual(Object.keys(ROUTES).sort());
    for (const { path, fields } of documented)
      expect([path, ROUTES[path].cases.map((c) => c.field).sort()]).toEqual([path, fields.sort()]);
  });

  const cases = Object.entries(ROUTES).flatMap(([path, route]) =>
    route.cases.map((c) => ({ path, route, c })),
  );
  it.each(cases)('PATCH $path — only $c.field changes', async ({ route, c }) => {
    if (c.setup) {
      const setup = await w.manager.patch(route.url(w)).send(c.setup(w.ids));
      expect(setup.status, JSON.stringify(setup.body)).toBe(200);
    }
    const before = await snapshot(route, w);
    const res = await w.manager.patch(route.url(w)).send({ [c.field]: c.value(w.ids) });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const after = await snapshot(route, w);
    const columns = c.children ? [] : (c.columns ?? [snake(c.field)]);
    // the field itself was written (so this case can fail), and nothing else was
    for (const column of columns) expect(after.row[column]).not.toEqual(before.row[column]);
    expect(without(after.row, [...columns, 'updated_at'])).toEqual(
      without(before.row, [...columns, 'updated_at']),
    );
    for (const table of Object.keys(before.children)) {
      if (c.children?.includes(table))
        expect(after.children[table]).not.toEqual(before.children[table]);
      else expect(after.children[table]).toEqual(before.children[table]);
    }
  });

  it.each(Object.entries(ROUTES))(
    'PATCH %s — an unknown field is refused (400 naming it) and nothing changes',
    async (_path, route) => {
      const before = await snapshot(route, w);
      const first = route.cases[0];
      const res = await w.manager
        .patch(route.url(w))
        .send({ [first.field]: first.value(w.ids), colour: 'green' });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual({ colour: 'Not a field of this request' });
      expect(await snapshot(route, w)).toEqual(before);
    },
  );
});
