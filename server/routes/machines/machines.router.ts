import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  machineCreateSchema,
  machineDetailResponseSchema,
  machineListQuerySchema,
  machineListResponseSchema,
  machineResponseSchema,
  machineUpdateSchema,
} from '../../../shared/schemas/machines';
import { authorize } from '../../policies/access';
import { canCreateMachine, canUpdateMachine, machineAbilities } from '../../policies/machine';
import { presentMachine, presentUsage } from '../../presenters/machine';
import { createMachine, listMachines, loadMachine, updateMachine } from '../../services/machines';
import { forecastOf, machineDueSummary } from '../../services/machine-detail';
import { ensureDuePointsCurrent } from '../../services/forecast';
import { tagOutState } from '../../services/machine-status';

const orgParams = z.object({ orgId: z.uuid() });
export const machineParams = orgParams.extend({ machineId: z.uuid() });

export function machinesRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines',
    summary: 'The fleet, one page at a time, filtered and sorted on the server',
    tags: ['machines'],
    params: orgParams,
    query: machineListQuerySchema,
    response: machineListResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      await ensureDuePointsCurrent(access.organization.id, access.organization.timeZone);
      const { total, items } = await listMachines(access, query);
      return {
        data: items.map((i) => presentMachine(i.machine, { ...i, via: access.via })),
        meta: { total, page: query.page, pageSize: query.pageSize },
        abilities: { create: canCreateMachine(access) },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines',
    summary: 'Add a machine to the fleet',
    tags: ['machines'],
    params: orgParams,
    body: machineCreateSchema,
    status: 201,
    response: machineResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canCreateMachine(access), 'Only a manager may add machines');
      const machine = await createMachine(access, body);
      return {
        data: presentMachine(machine, { via: access.via, operatorIds: body.operatorIds }),
        abilities: machineAbilities(access, machine),
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId',
    summary: 'One machine with its usage estimate and abilities',
    tags: ['machines'],
    params: machineParams,
    response: machineDetailResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      await ensureDuePointsCurrent(access.organization.id, access.organization.timeZone);
      const { machine, operatorIds } = await loadMachine(access, params.machineId);
      const { forecast, dueStatus, nextDueDate } = await machineDueSummary(access, machine);
      return {
        data: {
          ...presentMachine(machine, {
            via: access.via,
            operatorIds,
            forecast,
            dueStatus,
            nextDueDate,
          }),
          usage: presentUsage(forecast?.usage ?? null),
          tagOut: await tagOutState(access, machine),
        },
        abilities: machineAbilities(access, machine),
      };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/machines/:machineId',
    summary: 'Edit a machine (retire it with status "sold", tag it out with "tagged_out")',
    tags: ['machines'],
    params: machineParams,
    body: machineUpdateSchema,
    response: machineResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canUpdateMachine(access), 'Only a manager may edit machines');
      await updateMachine(access, machine, body);
      const { operatorIds } = await loadMachine(access, params.machineId);
      const forecast = await forecastOf(machine);
      return {
        data: presentMachine(machine, { via: access.via, operatorIds, forecast }),
        abilities: machineAbilities(access, machine),
      };
    },
  });

  return router;
}
