// How the matrix calls each route of the farm's fleet: machines, schedules, readings and the due
// list. Each builds a request valid for the record it names, so a refusal is never a validation
// error in disguise; a cell expected to succeed gets records of its own where it consumes one.
import type { Caller, Side } from './callers';
import type { Built, IdsIn } from './harness';
import { freshMachine, freshReading, freshTask, machineWithPhoto } from './fresh';
import { LAST_METER, PNG, inDays } from './seed-kit';
import type { FarmWorld, World } from './world';

export interface Ctx {
  w: World;
  caller: Caller;
  side: Side;
  /** whose ids the request sends: the farm's (own) or the other farm's (foreign) */
  rec: FarmWorld;
  /** the cell is expected to succeed: make what it consumes */
  succeeds: boolean;
  cookie: string | null;
}

export interface Case {
  ids: IdsIn;
  build: (ctx: Ctx) => Built | Promise<Built>;
  /** puts the world back after a success that changed a caller (not the records it reads) */
  undo?: (ctx: Ctx, body: { data?: { id?: string } }) => Promise<void>;
}

/** The farm every farm route is addressed to, whoever calls. */
export const onFarm = (ctx: Ctx) => ({ orgId: ctx.w.farm.org.id });
export const onMachine = (ctx: Ctx, machine = ctx.rec.machine) => ({
  orgId: ctx.w.farm.org.id,
  machineId: machine.id,
});
const png = (field: string) => ({ field, name: 'photo.png', type: 'image/png', content: PNG });
const csv = (ctx: Ctx) => ({
  field: 'file',
  name: 'readings.csv',
  type: 'text/csv',
  content: Buffer.from(
    `fleet number,taken at,value\n${ctx.w.farm.machine.fleetNumber},${new Date().toISOString()},${LAST_METER}\n`,
  ),
});
let n = 0;
/** A fleet file adding one machine (a new fleet number each time, so a commit always adds it). */
const fleetFile = () => ({
  field: 'file',
  name: 'fleet.csv',
  type: 'text/csv',
  content: Buffer.from(`fleet number,name,category\nFI-${++n},Yard loader,loader\n`),
});

export const FLEET_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/machines': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'POST /organizations/{orgId}/machines': {
    ids: 'none',
    build: (c) => ({
      params: onFarm(c),
      body: { fleetNumber: `L-${++n}`, name: 'Telehandler', category: 'loader' },
    }),
  },
  'GET /organizations/{orgId}/machines/{machineId}': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'GET /organizations/{orgId}/machines/{machineId} · assigned to another operator': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c, c.rec.othersMachine) }),
  },
  'PATCH /organizations/{orgId}/machines/{machineId}': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { notes: 'Front weights removed for the season' },
    }),
  },
  'PATCH /organizations/{orgId}/machines/{machineId} · tag out': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { status: 'tagged_out' },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/return-to-service': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec, 'tagged_out') : c.rec.taggedOut),
      body: { note: 'Brakes bled and tested on the yard' },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/restriction': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { reason: 'Field only — no road: left flasher out' },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/restriction/lift': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec, 'restricted') : c.rec.machine),
      body: { note: 'Flasher bulb replaced' },
    }),
  },
  'PUT /organizations/{orgId}/machines/{machineId}/photo': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), file: png('photo') }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/photo': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'DELETE /organizations/{orgId}/machines/{machineId}/photo': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await machineWithPhoto(c.rec) : c.rec.machine),
    }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/label.svg': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'GET /organizations/{orgId}/fleet-import/example': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'POST /organizations/{orgId}/fleet-import/preview': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), file: fleetFile() }),
  },
  'POST /organizations/{orgId}/fleet-import/commit': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), file: fleetFile() }),
  },
  // schedules
  'GET /organizations/{orgId}/machines/{machineId}/tasks': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/tasks': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), body: { name: 'Air filter', intervalMeter: 250 } }),
  },
  'PATCH /organizations/{orgId}/tasks/{taskId}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), taskId: (c.succeeds ? await freshTask(c.rec) : c.rec.task).id },
      body: { instructions: 'Drain warm; the filter wrench is on the shop wall' },
    }),
  },
  'DELETE /organizations/{orgId}/tasks/{taskId}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), taskId: (c.succeeds ? await freshTask(c.rec) : c.rec.task).id },
    }),
  },
  'PUT /organizations/{orgId}/tasks/{taskId}/last-done': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), taskId: (c.succeeds ? await freshTask(c.rec) : c.rec.task).id },
      body: { lastDoneMeter: LAST_METER - 50, lastDoneOn: inDays(-5) },
    }),
  },
  'POST /organizations/{orgId}/tasks/{taskId}/count-from-now': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onFarm(c),
        taskId: (c.succeeds
          ? await freshTask(c.rec, undefined, { historyUnknown: true })
          : c.rec.unknownTask
        ).id,
      },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/count-from-now': {
    ids: 'path',
    build: async (c) => {
      if (!c.succeeds) return { params: onMachine(c) };
      const machine = await freshMachine(c.rec);
      await freshTask(c.rec, machine, { historyUnknown: true });
      return { params: onMachine(c, machine) };
    },
  },
  'GET /organizations/{orgId}/schedule-templates': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'POST /organizations/{orgId}/schedule-templates': {
    ids: 'none',
    build: (c) => ({
      params: onFarm(c),
      body: {
        category: 'baler',
        name: `Baler basics ${++n}`,
        tasks: [{ name: 'Knotter check', intervalDays: 30 }],
      },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/apply-template': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { templateId: c.rec.scheduleTemplateId },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/apply-class': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { machineClass: 'implement' },
    }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/spec-sheet': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'PATCH /organizations/{orgId}/machines/{machineId}/spec-sheet': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), body: { notes: "From the operator's manual" } }),
  },
  // readings
  'GET /organizations/{orgId}/machines/{machineId}/readings': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/readings': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), body: { value: LAST_METER } }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/readings · assigned to another operator': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c, c.rec.othersMachine), body: { value: LAST_METER } }),
  },
  'GET /organizations/{orgId}/readings/latest': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'POST /organizations/{orgId}/readings/bulk': {
    ids: 'field',
    build: (c) => ({
      params: onFarm(c),
      body: { readings: [{ machineId: c.rec.machine.id, value: LAST_METER }] },
    }),
  },
  'PATCH /organizations/{orgId}/readings/{readingId}': {
    ids: 'path',
    build: (c) => ({
      params: { ...onFarm(c), readingId: c.rec.readingId },
      body: { value: LAST_METER - 300 },
    }),
  },
  'DELETE /organizations/{orgId}/readings/{readingId}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), readingId: c.succeeds ? await freshReading(c.rec) : c.rec.readingId },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/meter-replacements': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { oldFinalValue: LAST_METER, newStartValue: 0, replacedAt: new Date().toISOString() },
    }),
  },
  'POST /organizations/{orgId}/readings/import/preview': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), file: csv(c) }),
  },
  'POST /organizations/{orgId}/readings/import/commit': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), file: csv(c) }),
  },
  'GET /organizations/{orgId}/due': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /organizations/{orgId}/daily-care': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /organizations/{orgId}/machines/{machineId}/due': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
};
