import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  meterCreateSchema,
  meterListResponseSchema,
  meterResponseSchema,
  meterUpdateSchema,
} from '../../../shared/schemas/meters';
import {
  counterResetSchema,
  meterReplacementResponseSchema,
} from '../../../shared/schemas/readings';
import { authorize } from '../../policies/access';
import { canManageMeters, canResetCounter, meterAbilities } from '../../policies/meter';
import { logReadingRefusal } from '../../policies/machine';
import { presentMeter } from '../../presenters/meter';
import { presentReplacement } from '../../presenters/reading';
import { loadMachine } from '../../services/machines';
import { replaceMeter } from '../../services/meter-changes';
import { addMeter, listMeters, makePrimary, removeMeter, updateMeter } from '../../services/meters';
import type { OrgAccess } from '../../policies/context';
import type { Machine } from '../../models';

const machineParams = z.object({ orgId: z.uuid(), machineId: z.uuid() });
const meterParams = machineParams.extend({ meterId: z.uuid() });
const MANAGE_REFUSAL = 'Only a manager or technician may change a machine’s meters';

/** One meter as listed (its summary and task count), after a change. */
async function presented(access: OrgAccess, machine: Machine, meterId: string) {
  const item = (await listMeters(access, machine)).find((i) => i.meter.id === meterId)!;
  return presentMeter(item.meter, item);
}

export function metersRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/meters',
    summary: "A machine's meters (primary first), each with its last reading and usage",
    tags: ['meters'],
    params: machineParams,
    response: meterListResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const items = await listMeters(access, machine);
      return {
        data: items.map((i) => presentMeter(i.meter, i)),
        abilities: meterAbilities(access, machine),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/meters',
    summary: 'Add a meter to a machine (separator hours, PTO hours, a bale counter…)',
    tags: ['meters'],
    params: machineParams,
    body: meterCreateSchema,
    status: 201,
    response: meterResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canManageMeters(access), MANAGE_REFUSAL);
      const meter = await addMeter(access, machine, body);
      return { data: await presented(access, machine, meter.id) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/machines/:machineId/meters/:meterId',
    summary: 'Rename or reorder a meter (only the fields sent)',
    tags: ['meters'],
    params: meterParams,
    body: meterUpdateSchema,
    response: meterResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canManageMeters(access), MANAGE_REFUSAL);
      await updateMeter(access, machine, params.meterId, body);
      return { data: await presented(access, machine, params.meterId) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/machines/:machineId/meters/:meterId',
    summary: 'Remove a meter that has no readings and no tasks (never the primary)',
    tags: ['meters'],
    params: meterParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canManageMeters(access), MANAGE_REFUSAL);
      await removeMeter(access, machine, params.meterId);
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/meters/:meterId/primary',
    summary: 'Make a meter the primary one (readings and tasks without a meter id go on it)',
    tags: ['meters'],
    params: meterParams,
    response: meterResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canManageMeters(access), MANAGE_REFUSAL);
      await makePrimary(access, machine, params.meterId);
      return { data: await presented(access, machine, params.meterId) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/meter-resets',
    summary:
      'Record a counter reset (count before, count after — usually 0); lifetime values run on, operators may',
    tags: ['meters'],
    params: machineParams,
    body: counterResetSchema,
    status: 201,
    response: meterReplacementResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canResetCounter(access, machine), logReadingRefusal(machine));
      const { resetAt, ...rest } = body;
      const reset = await replaceMeter(
        access,
        machine,
        { ...rest, replacedAt: new Date(resetAt) },
        'reset',
      );
      return { data: presentReplacement(reset) };
    },
  });

  return router;
}
