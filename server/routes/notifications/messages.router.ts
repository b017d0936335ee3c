import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canViewSentMessages } from '../../policies/reminders';
import { presentNotification, presentNotificationSummary } from '../../presenters/notification';
import {
  notificationListQuerySchema,
  sentMessageListResponseSchema,
  sentMessageResponseSchema,
} from '../../../shared/schemas/notifications';
import { listSentMessages, loadSentMessage } from '../../services/sent-messages';

const orgParams = z.object({ orgId: z.uuid() });
const FORBIDDEN = 'Only a manager may read the messages sent from this organization';

/** "Sent messages": the organization's outbox, newest first, and one message's content. */
export function messagesRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/notifications',
    summary: 'E-mails sent, queued or failed for this organization (the outbox), newest first',
    tags: ['notifications'],
    params: orgParams,
    query: notificationListQuerySchema,
    response: sentMessageListResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      authorize(canViewSentMessages(access), FORBIDDEN);
      const { rows, counts, total } = await listSentMessages(access, query);
      return {
        data: rows.map(presentNotificationSummary),
        meta: { total, page: query.page, pageSize: query.pageSize, counts },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/notifications/:id',
    summary: 'One e-mail of the outbox with its content',
    tags: ['notifications'],
    params: orgParams.extend({ id: z.uuid() }),
    response: sentMessageResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      authorize(canViewSentMessages(access), FORBIDDEN);
      const row = await loadSentMessage(access, params.id);
      return { data: presentNotification(row) };
    },
  });

  return router;
}
