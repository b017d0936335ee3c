import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  firstRunChecklistSchema,
  firstRunDismissalSchema,
} from '../../../shared/schemas/onboarding';
import { authorize } from '../../policies/access';
import { canUseFirstRunChecklist } from '../../policies/first-run';
import { firstRunChecklist, setFirstRunDismissed } from '../../services/first-run';

const orgParams = z.object({ orgId: z.uuid() });
const NOT_ALLOWED = "The first-run checklist is for a farm's managers";

/** The first-run checklist of a new farm's dashboard, and putting it away. */
export function firstRunRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/first-run-checklist',
    summary:
      "A new farm's first steps (machines, schedules, last done, team, dealer, digest hour), each ticked from the farm's data",
    tags: ['onboarding'],
    params: orgParams,
    response: z.object({ data: firstRunChecklistSchema }),
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canUseFirstRunChecklist(access), NOT_ALLOWED);
      return { data: await firstRunChecklist(access) };
    },
  });

  route(router, {
    method: 'put',
    path: '/organizations/:orgId/first-run-checklist/dismissal',
    summary: 'Put the first-run checklist away for the signed-in manager (or bring it back)',
    tags: ['onboarding'],
    params: orgParams,
    body: firstRunDismissalSchema,
    response: z.object({ data: firstRunChecklistSchema }),
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canUseFirstRunChecklist(access), NOT_ALLOWED);
      await setFirstRunDismissed(access, body.dismissed);
      return { data: await firstRunChecklist(access) };
    },
  });

  return router;
}
