import { Router } from 'express';
import { z } from 'zod';
import { rawResponse, route } from '../route';
import { documentRoute } from '../../openapi';
import { notFound } from '../../errors';
import {
  calendarFeedCreateSchema,
  calendarFeedResponseSchema,
  calendarFeedsResponseSchema,
} from '../../../shared/schemas/notifications';
import { createFeed, feedCalendar, feedsFor, revokeFeed } from '../../services/calendar';
import { presentFeed } from '../../presenters/notification';
import { authorize } from '../../policies/access';
import { canHavePersonalFeed } from '../../policies/reminders';

const orgParams = z.object({ orgId: z.uuid() });
const feedParams = z.object({
  token: z
    .string()
    .regex(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{20,100}$/, { error: 'Not a feed address' }),
});

/** Private calendar feeds: the .ics itself (public, by secret token) and managing the links. */
export function calendarRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/calendar/:token.ics',
    summary: 'The iCalendar feed (RFC 5545) of a farm or a person: one all-day event per due task',
    tags: ['calendar'],
    access: 'public',
    params: feedParams,
    response: rawResponse('text/calendar', 'iCalendar text'),
    handler: async ({ res, params }) => {
      const ics = await feedCalendar(params.token);
      if (ics === null) throw notFound('Calendar feed');
      res
        .status(200)
        .type('text/calendar; charset=utf-8')
        .set('Cache-Control', 'private, max-age=300')
        .send(ics);
    },
  });
  // The feed answers text/calendar, not JSON: say so in the OpenAPI document.
  documentRoute({
    method: 'get',
    path: '/calendar/{token}.ics',
    summary: 'The iCalendar feed (RFC 5545) of a farm or a person: one all-day event per due task',
    tags: ['calendar'],
    request: { params: feedParams },
    responses: {
      200: {
        description: 'iCalendar text',
        content: { 'text/calendar': { schema: z.string() } },
      },
      400: { description: 'Not a feed address' },
      404: { description: 'Unknown or revoked feed' },
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/calendar-feeds',
    summary: "The caller's personal feed link and, for a manager, the farm's",
    tags: ['calendar'],
    params: orgParams,
    response: calendarFeedsResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canHavePersonalFeed(access), 'Calendar feeds are for the people of a farm');
      const { personal, farm } = await feedsFor(access);
      return {
        data: {
          personal: personal ? presentFeed(personal) : null,
          farm: farm ? presentFeed(farm) : null,
        },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/calendar-feeds',
    summary:
      'Creates a feed link (personal, or the farm for a manager); an older link of it stops working',
    tags: ['calendar'],
    params: orgParams,
    body: calendarFeedCreateSchema,
    status: 201,
    response: calendarFeedResponseSchema,
    handler: async ({ req, body }) => ({
      data: presentFeed(await createFeed(req.access!, body.scope)),
    }),
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/calendar-feeds/:feedId',
    summary: 'Revokes a feed link: the calendar address answers 404 from then on',
    tags: ['calendar'],
    params: orgParams.extend({ feedId: z.uuid() }),
    status: 204,
    handler: async ({ req, params }) => {
      await revokeFeed(req.access!, params.feedId);
    },
  });

  return router;
}
