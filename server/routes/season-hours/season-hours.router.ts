import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canUpdateMachine } from '../../policies/machine';
import { loadMachine } from '../../services/machines';
import { seasonHours, setSeasonPlan } from '../../services/season-hours';
import { todayIso } from '../../../shared/domain';
import {
  seasonHoursResponseSchema,
  seasonPlanInputSchema,
  seasonPlanResponseSchema,
} from '../../../shared/schemas/season-hours';

const year = z.coerce
  .number({ error: 'Year must be a number' })
  .int({ error: 'Year must be a whole number' })
  .min(2000, { error: 'Year must be 2000 or later' })
  .max(2100, { error: 'Year must be 2100 or earlier' });
const orgParams = z.object({ orgId: z.uuid() });
const planParams = orgParams.extend({ machineId: z.uuid(), year });
const MANAGERS_ONLY = 'Only a manager may plan a season';

/** Season hours: this season against last, and the plans that feed the forecast. */
export function seasonHoursRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/season-hours',
    summary:
      "Each machine's use in its season this year (to today) against last year's (to the same date, and whole), with its plan for the season",
    tags: ['forecast'],
    params: orgParams,
    query: z.object({ year: year.optional() }),
    response: seasonHoursResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      const now = new Date();
      const asOfYear = Number(todayIso(access.organization.timeZone, now).slice(0, 4));
      const y = query.year ?? asOfYear;
      const { asOf, rows } = await seasonHours(access, y, now);
      return { data: rows, meta: { year: y, asOf } };
    },
  });

  route(router, {
    method: 'put',
    path: '/organizations/:orgId/machines/:machineId/season-plans/:year',
    summary:
      "Plan a machine's season: a meter value, or an area with its work rate (hours = area ÷ rate); the forecast takes it as the season's pace until the season shows its own",
    tags: ['forecast'],
    params: planParams,
    body: seasonPlanInputSchema,
    response: seasonPlanResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canUpdateMachine(access), MANAGERS_ONLY);
      return { data: (await setSeasonPlan(access, machine, params.year, body))! };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/machines/:machineId/season-plans/:year',
    summary: "Remove a machine's plan for a season (the forecast goes back to its past seasons)",
    tags: ['forecast'],
    params: planParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canUpdateMachine(access), MANAGERS_ONLY);
      await setSeasonPlan(access, machine, params.year, null);
    },
  });

  return router;
}
