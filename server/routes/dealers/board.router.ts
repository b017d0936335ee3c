import type { Request, Router } from 'express';
import { z } from 'zod';
import { rawResponse, route } from '../route';
import {
  boardQuerySchema,
  partsForecastQuerySchema,
  reminderSchema,
} from '../../../shared/schemas/dealers';
import { uuid } from '../../../shared/schemas/common';
import { invalid } from '../../errors';
import { authorize } from '../../policies/access';
import { canSendReminders, canUseDealerBoard } from '../../policies/dealer-link';
import {
  boardResponseSchema,
  partsForecastResponseSchema,
  reminderDraftResponseSchema,
  reminderSentResponseSchema,
} from '../../../shared/schemas/dealer-responses';
import { boardCsv, partsCsv } from '../../presenters/dealer-csv';
import { boardRows, dealerBoard } from '../../services/dealer-board';
import { partsForecast } from '../../services/parts-forecast';
import { reminderDraft, sendReminder } from '../../services/dealer-reminders';
import { todayIso } from '../../../shared/domain';
import { orgParams, requireDealerOrg } from './sides';

const customerParams = orgParams.extend({ customerId: z.uuid() });
const pathOf = (req: Request) => req.originalUrl.split('?')[0];
const csvResponse = rawResponse('text/csv', 'CSV, as an attachment');

function sendCsv(req: Request, name: string, body: string) {
  const res = req.res!;
  const day = todayIso(req.access!.organization.timeZone);
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${name}-${day}.csv"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.status(200).send(body);
}

function advisor(req: Request) {
  const access = requireDealerOrg(req.access);
  authorize(canUseDealerBoard(access), 'Only a service advisor uses the board');
  return access;
}

/** The dealer's board (and CSV), parts forecast (and CSV), and reminders to customers. */
export function registerBoardRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/board',
    summary:
      "Coming due across the dealer's active customers: each farm's due rows inside the horizon, overdue first then by date, with the customer and the last reading's age; paged",
    tags: ['dealers'],
    params: orgParams,
    query: boardQuerySchema,
    response: boardResponseSchema,
    handler: async ({ req, query }) => {
      const access = advisor(req);
      const board = await dealerBoard(access, query, pathOf(req));
      return {
        // the customer's time zone served the server's date arithmetic only
        data: board.rows.map(({ customer: { timeZone: _tz, ...customer }, ...row }) => ({
          ...row,
          customer,
        })),
        meta: {
          asOf: board.asOf,
          total: board.total,
          page: query.page,
          pageSize: query.pageSize,
          counts: board.counts,
          customers: board.customers,
        },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/board.csv',
    summary: 'The board as CSV (the same filters, every page), as an attachment',
    tags: ['dealers'],
    params: orgParams,
    query: boardQuerySchema.omit({ page: true, pageSize: true }),
    response: csvResponse,
    handler: async ({ req, query }) => {
      const access = advisor(req);
      const { rows } = await boardRows(access, query, pathOf(req));
      sendCsv(req, 'coming-due', boardCsv(rows));
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/parts-forecast',
    summary:
      'Parts and fluids the due services inside the horizon call for, summed by part number (quantity, machines, first date needed), per customer and in total',
    tags: ['dealers'],
    params: orgParams,
    query: partsForecastQuerySchema,
    response: partsForecastResponseSchema,
    handler: async ({ req, query }) => {
      const access = advisor(req);
      return { data: await partsForecast(access, query, pathOf(req)) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/parts-forecast.csv',
    summary: 'The parts forecast as CSV: per customer, then the totals, as an attachment',
    tags: ['dealers'],
    params: orgParams,
    query: partsForecastQuerySchema,
    response: csvResponse,
    handler: async ({ req, query }) => {
      const access = advisor(req);
      sendCsv(req, 'parts-forecast', partsCsv(await partsForecast(access, query, pathOf(req))));
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/customers/:customerId/reminder-draft',
    summary:
      "The templated reminder about these due services (subject and text to edit) and who receives it (the farm's managers)",
    tags: ['dealers'],
    params: customerParams,
    query: z.object({
      taskIds: z.string().max(3000).openapi({ description: 'task ids, comma-separated' }),
    }),
    response: reminderDraftResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = advisor(req);
      const ids = query.taskIds
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean);
      if (!ids.length) throw invalid({ taskIds: 'Choose at least one service' });
      const bad = ids.findIndex((id) => !uuid.safeParse(id).success);
      if (bad >= 0) throw invalid({ [`taskIds.${bad}`]: 'Must be an id (uuid)' });
      return { data: await reminderDraft(access, params.customerId, ids, pathOf(req)) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/customers/:customerId/reminders',
    summary:
      "Send a reminder about due services to the farm's managers through the outbox (kind dealer_reminder); the same requestId sends once",
    tags: ['dealers'],
    params: customerParams,
    body: reminderSchema,
    status: 201,
    response: reminderSentResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = advisor(req);
      authorize(canSendReminders(access));
      return { data: await sendReminder(access, params.customerId, body, pathOf(req)) };
    },
  });
}
