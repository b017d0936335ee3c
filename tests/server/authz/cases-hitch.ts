// How the matrix calls the hitch log's routes (issue 13): each write on an implement of its own
// (a fresh one each time, so a success never meets an overlap) and the farm's tractor, the
// machine the farm's operator is assigned to.
import { HitchSpan } from '../../../server/models/hitch-span';
import { createMachine } from '../../support/factories';
import { onFarm, onMachine, type Case, type Ctx } from './cases-fleet';

const implementOf = (c: Ctx) => createMachine(c.rec.org, { category: 'implement' });

/** An open span of a fresh implement on the record's tractor, started two hours ago. */
async function freshSpan(c: Ctx): Promise<string> {
  const implement = await implementOf(c);
  const span = await HitchSpan.create({
    organizationId: c.rec.org.id,
    implementId: implement.id,
    tractorId: c.rec.machine.id,
    meterKind: 'engine_hours',
    startedAt: new Date(Date.now() - 2 * 3_600_000),
    endedAt: null,
    enteredBy: null,
  });
  return span.id;
}

export const HITCH_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/machines/{machineId}/hitch-spans': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/hitch-spans': {
    ids: 'field',
    build: async (c) => ({
      params: onFarm(c),
      body: { implementId: (await implementOf(c)).id, tractorId: c.rec.machine.id },
    }),
  },
  'POST /organizations/{orgId}/hitch-spans/{spanId}/end': {
    ids: 'path',
    build: async (c) => ({ params: { ...onFarm(c), spanId: await freshSpan(c) }, body: {} }),
  },
  'PATCH /organizations/{orgId}/hitch-spans/{spanId}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), spanId: await freshSpan(c) },
      body: { note: 'Rear linkage' },
    }),
  },
  'DELETE /organizations/{orgId}/hitch-spans/{spanId}': {
    ids: 'path',
    build: async (c) => ({ params: { ...onFarm(c), spanId: await freshSpan(c) } }),
  },
};
