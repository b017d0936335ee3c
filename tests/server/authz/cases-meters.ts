// How the matrix calls the meter routes (issue 13). A cell expected to succeed works on a machine
// of its own (a meter added, renamed, removed or made primary there), so every other cell finds
// the world's machine with its one primary meter as seeded.
import { MachineMeter, type Machine } from '../../../server/models';
import { createMeter } from '../../support/factories';
import type { Case, Ctx } from './cases-fleet';
import { onMachine } from './cases-fleet';
import { freshMachine } from './fresh';
import { LAST_METER } from './seed-kit';

/** The machine's primary meter. */
const primaryOf = async (machine: Machine) =>
  (await MachineMeter.findOne({ where: { machineId: machine.id, isPrimary: true } }))!;

/** The machine and meter a cell names: a fresh machine with a PTO meter when it is to succeed. */
async function target(c: Ctx) {
  if (!c.succeeds) return { machine: c.rec.machine, meter: await primaryOf(c.rec.machine) };
  const machine = await freshMachine(c.rec);
  return { machine, meter: await createMeter(machine, 'pto_hours') };
}

const onMeter = async (c: Ctx) => {
  const { machine, meter } = await target(c);
  return { ...onMachine(c, machine), meterId: meter.id };
};

export const METER_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/machines/{machineId}/meters': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/meters': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { kind: 'pto_hours' },
    }),
  },
  'PATCH /organizations/{orgId}/machines/{machineId}/meters/{meterId}': {
    ids: 'path',
    build: async (c) => ({ params: await onMeter(c), body: { label: 'Rear PTO' } }),
  },
  'DELETE /organizations/{orgId}/machines/{machineId}/meters/{meterId}': {
    ids: 'path',
    build: async (c) => ({ params: await onMeter(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/meters/{meterId}/primary': {
    ids: 'path',
    build: async (c) => ({ params: await onMeter(c) }),
  },
  // a counter reset is for a counting meter: a bale counter on the fresh machine
  'POST /organizations/{orgId}/machines/{machineId}/meter-resets': {
    ids: 'path',
    build: async (c) => {
      const machine = c.succeeds ? await freshMachine(c.rec) : c.rec.machine;
      const meterId = c.succeeds ? (await createMeter(machine, 'bales')).id : undefined;
      return {
        params: onMachine(c, machine),
        body: { oldFinalValue: LAST_METER + 10, resetAt: new Date().toISOString(), meterId },
      };
    },
  },
};
