import { Router } from 'express';
import { route } from '../route';
import {
  measurementSeriesQuerySchema,
  shopWeekQuerySchema,
} from '../../../shared/schemas/service-records';
import { authorize } from '../../policies/access';
import { canViewShopWeek } from '../../policies/service-record';
import { loadMachine } from '../../services/machines';
import { measurementNames, measurementSeries } from '../../services/service-history';
import { shopWeek } from '../../services/shop-week';
import {
  measurementNamesResponseSchema,
  measurementSeriesResponseSchema,
  shopWeekResponseSchema,
} from '../../../shared/schemas/service-record-responses';
import { specStatus } from '../../presenters/service-record';
import { presentShopWeek, shopWeekPeopleIds } from '../../presenters/shop-week';
import { peopleById } from '../../presenters/people';
import { registerServiceRecordRoutes, machineParams, orgParams } from './service-records.router';
import { registerAttachmentRoutes } from './attachments.router';

/** Service records, their attachments, measurement series and the shop's week. */
export function serviceRecordsRouter(): Router {
  const router = Router();
  registerServiceRecordRoutes(router);
  registerAttachmentRoutes(router);

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/measurements',
    summary: "The measurements a machine's completed services carry (names for a chart picker)",
    tags: ['services'],
    params: machineParams,
    response: measurementNamesResponseSchema,
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
    response: measurementSeriesResponseSchema,
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
    response: shopWeekResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      authorize(canViewShopWeek(access), 'The shop week is for technicians and managers');
      const week = await shopWeek(access, query.start);
      return { data: presentShopWeek(week, await peopleById(shopWeekPeopleIds(week))) };
    },
  });

  return router;
}
