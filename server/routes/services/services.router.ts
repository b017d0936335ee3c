import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  measurementSeriesQuerySchema,
  shopWeekQuerySchema,
} from '../../../shared/schemas/services';
import { authorize } from '../../policies/access';
import { canViewShopWeek } from '../../policies/service-record';
import { loadMachine } from '../../services/machines';
import { measurementNames, measurementSeries } from '../../services/service-records';
import { shopWeek } from '../../services/shop-week';
import { machineRefSchema } from '../../presenters/defect';
import { personSchema } from '../../presenters/people';
import { dueRowSchema } from '../../presenters/due';
import { specStatus } from '../../presenters/service-record';
import { registerServiceRecordRoutes, machineParams, orgParams } from './service-records.router';
import { registerAttachmentRoutes } from './attachments.router';

const partsToPull = z.array(
  z.object({ partNumber: z.string(), description: z.string(), quantity: z.number() }),
);
const fluidsToPull = z.array(z.object({ kind: z.string(), unit: z.string(), volume: z.number() }));
// The due list's row (as GET …/due answers it), with the plan that covers the task, if any.
const bookedDueRow = dueRowSchema.extend({
  booked: z.object({ recordId: z.string(), plannedFor: z.string() }).nullable(),
});

/** Service records, their attachments, measurement series and the shop's week. */
export function servicesRouter(): Router {
  const router = Router();
  registerServiceRecordRoutes(router);
  registerAttachmentRoutes(router);

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/measurements',
    summary: "The measurements a machine's completed services carry (names for a chart picker)",
    tags: ['services'],
    params: machineParams,
    response: z.object({
      data: z.array(
        z.object({
          name: z.string(),
          unit: z.string(),
          count: z.number(),
          lastOn: z.string(),
          lastValue: z.number(),
        }),
      ),
    }),
    handler: async ({ req, params }) => {
      const { machine } = await loadMachine(req.access!, params.machineId);
      return { data: await measurementNames(req.access!, machine) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/measurements/series',
    summary: 'One measurement over time on a machine (completed visits, oldest first), for a chart',
    tags: ['services'],
    params: machineParams,
    query: measurementSeriesQuerySchema,
    response: z.object({
      data: z.array(
        z.object({
          recordId: z.string(),
          performedOn: z.string(),
          meterValue: z.number().nullable(),
          value: z.number(),
          unit: z.string(),
          specMin: z.number().nullable(),
          specMax: z.number().nullable(),
          inSpec: z.boolean().nullable(),
        }),
      ),
      meta: z.object({ name: z.string() }),
    }),
    handler: async ({ req, params, query }) => {
      const { machine } = await loadMachine(req.access!, params.machineId);
      const points = await measurementSeries(req.access!, machine, query.name);
      return {
        data: points.map((p) => {
          const status = specStatus(p.value, p.specMin, p.specMax);
          return { ...p, inSpec: status === null ? null : status === 'in' };
        }),
        meta: { name: query.name },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/shop-week',
    summary:
      "The shop's week (Monday start by default): per day the planned records with estimated labour and parts to pull, and the tasks falling due that day",
    tags: ['services'],
    params: orgParams,
    query: shopWeekQuerySchema,
    response: z.object({
      data: z.object({
        start: z.string(),
        end: z.string(),
        asOf: z.string(),
        days: z.array(
          z.object({
            date: z.string(),
            weekday: z.string(),
            planned: z.array(
              z.object({
                id: z.string(),
                plannedFor: z.string(),
                machine: machineRefSchema,
                tasks: z.array(
                  z.object({
                    taskId: z.string(),
                    name: z.string(),
                    labourHours: z.number().nullable(),
                  }),
                ),
                technicians: z.array(personSchema),
                notes: z.string(),
                defectIds: z.array(z.string()),
                estimatedLabourHours: z.number(),
                partsToPull,
                fluidsToPull,
              }),
            ),
            due: z.array(bookedDueRow),
            plannedLabourHours: z.number(),
            unbookedDueLabourHours: z.number(),
            partsToPull,
            fluidsToPull,
          }),
        ),
        overdue: z.array(bookedDueRow),
        totals: z.object({
          plannedRecords: z.number(),
          dueTasks: z.number(),
          overdueTasks: z.number(),
          plannedLabourHours: z.number(),
          unbookedDueLabourHours: z.number(),
          partsToPull,
          fluidsToPull,
        }),
      }),
    }),
    handler: async ({ req, query }) => {
      const access = req.access!;
      authorize(canViewShopWeek(access), 'The shop week is for technicians and managers');
      return { data: await shopWeek(access, query.start) };
    },
  });

  return router;
}
