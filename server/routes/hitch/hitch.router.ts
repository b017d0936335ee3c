import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  hitchLogResponseSchema,
  hitchSpanCreateSchema,
  hitchSpanEndSchema,
  hitchSpanResponseSchema,
  hitchSpanUpdateSchema,
} from '../../../shared/schemas/hitch';
import { notFound } from '../../errors';
import { presentHitchLog, presentHitchSpan } from '../../presenters/hitch';
import { hitchLog } from '../../services/hitch-log';
import { correctSpan, deleteSpan, endSpan, startSpan } from '../../services/hitch-spans';
import type { OrgAccess } from '../../policies/access';

const orgParams = z.object({ orgId: z.uuid() });
const spanParams = orgParams.extend({ spanId: z.uuid() });

/** The span as the implement's log presents it, after a write. */
async function presented(access: OrgAccess, span: { id: string; implementId: string }) {
  const log = await hitchLog(access, span.implementId);
  const row = log.spans.find((s) => s.id === span.id);
  if (!row) throw notFound('Hitch span');
  return { data: presentHitchSpan(row) };
}

/** The hitch log: which tractor pulled which implement, from when to when (issue 13). */
export function hitchRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/hitch-spans',
    summary:
      "A machine's hitch log: spans as the implement or the tractor, newest first, with the implement's hours from hitching",
    tags: ['hitch'],
    params: orgParams.extend({ machineId: z.uuid() }),
    response: hitchLogResponseSchema,
    handler: async ({ req, params }) => ({
      data: presentHitchLog(await hitchLog(req.access!, params.machineId)),
    }),
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/hitch-spans',
    summary:
      'Hitch an implement to a tractor (now, or the times given); the implement counts the tractor meter from then',
    tags: ['hitch'],
    params: orgParams,
    body: hitchSpanCreateSchema,
    status: 201,
    response: hitchSpanResponseSchema,
    handler: async ({ req, body }) => presented(req.access!, await startSpan(req.access!, body)),
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/hitch-spans/:spanId/end',
    summary: 'Unhitch: the span ends now, or at the time given',
    tags: ['hitch'],
    params: spanParams,
    body: hitchSpanEndSchema,
    response: hitchSpanResponseSchema,
    handler: async ({ req, params, body }) =>
      presented(req.access!, await endSpan(req.access!, params.spanId, body)),
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/hitch-spans/:spanId',
    summary: "Correct a span (managers, technicians); the implement's hours are worked out again",
    tags: ['hitch'],
    params: spanParams,
    body: hitchSpanUpdateSchema,
    response: hitchSpanResponseSchema,
    handler: async ({ req, params, body }) =>
      presented(req.access!, await correctSpan(req.access!, params.spanId, body)),
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/hitch-spans/:spanId',
    summary: 'Remove a span entered by mistake (managers, technicians)',
    tags: ['hitch'],
    params: spanParams,
    status: 204,
    handler: async ({ req, params }) => {
      await deleteSpan(req.access!, params.spanId);
    },
  });

  return router;
}
