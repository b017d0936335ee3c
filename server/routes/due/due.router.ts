import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { dueListQuerySchema } from '../../../shared/schemas/readings';
import { dueListResponseSchema } from '../../../shared/schemas/due';
import { dueList } from '../../services/due-list';
import { loadMachine } from '../../services/machines';
import { dailyCareBoardResponseSchema } from '../../../shared/schemas/daily-care';
import { dailyCareBoard } from '../../services/daily-care-board';
import { presentMachineRef } from '../../presenters/defect';

const orgParams = z.object({ orgId: z.uuid() });

export function dueRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/due',
    summary:
      'The due list across the farm: overdue first, then by the date each task falls due; counts by status of the whole fleet, its size, and stale meters',
    tags: ['due'],
    params: orgParams,
    query: dueListQuerySchema,
    response: dueListResponseSchema,
    handler: async ({ req, query }) => {
      const { asOf, rows, counts, machines, stale, total } = await dueList(req.access!, query);
      return {
        data: rows,
        meta: { asOf, counts, machines, stale, total, page: query.page, pageSize: query.pageSize },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/due',
    summary: "One machine's due points",
    tags: ['due'],
    params: orgParams.extend({ machineId: z.uuid() }),
    response: dueListResponseSchema,
    handler: async ({ req, params }) => {
      await loadMachine(req.access!, params.machineId);
      const { asOf, rows, counts, stale, total } = await dueList(req.access!, {
        machineId: params.machineId,
      });
      const own = stale.filter((s) => s.machine.id === params.machineId);
      return {
        data: rows,
        meta: { asOf, counts, machines: 1, stale: own, total, page: 1, pageSize: total },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/daily-care',
    summary:
      "Daily care across the farm: each machine's grease rounds and daily items (signed off in the walkaround) and where each stands today — overdue, not yet today, done today; operators see the machines they may walk round",
    tags: ['due'],
    params: orgParams,
    response: dailyCareBoardResponseSchema,
    handler: async ({ req }) => {
      const { asOf, rows } = await dailyCareBoard(req.access!);
      return {
        data: rows.map((r) => ({ ...r, machine: presentMachineRef(r.machine) })),
        meta: { asOf },
      };
    },
  });

  return router;
}
