import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { Notification } from '../../models';
import { notFound } from '../../errors';
import { authorize } from '../../policies/access';
import { canViewSentMessages } from '../../policies/reminders';
import { presentNotification, presentNotificationSummary } from '../../presenters/notification';
import {
  NOTIFICATION_STATUSES,
  notificationListQuerySchema,
  sentMessageListResponseSchema,
  sentMessageResponseSchema,
  type NotificationStatusName,
} from '../../../shared/schemas/notifications';
import { sequelize } from '../../db';

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
      const organizationId = access.organization.id;
      const where = { organizationId, ...(query.status && { status: query.status }) };
      const [rows, grouped] = await Promise.all([
        Notification.findAll({
          where,
          attributes: { exclude: ['textBody', 'htmlBody'] },
          order: [
            ['createdAt', 'DESC'],
            ['id', 'ASC'],
          ],
          limit: query.pageSize,
          offset: (query.page - 1) * query.pageSize,
        }),
        Notification.findAll({
          where: { organizationId },
          attributes: ['status', [sequelize.fn('count', sequelize.col('id')), 'n']],
          group: ['status'],
          raw: true,
        }) as unknown as Promise<{ status: NotificationStatusName; n: string }[]>,
      ]);
      const counts = Object.fromEntries(NOTIFICATION_STATUSES.map((s) => [s, 0])) as Record<
        NotificationStatusName,
        number
      >;
      for (const g of grouped) counts[g.status] = Number(g.n);
      const total = query.status
        ? counts[query.status]
        : Object.values(counts).reduce((a, b) => a + b, 0);
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
      const row = await Notification.findOne({
        where: { id: params.id, organizationId: access.organization.id },
      });
      if (!row) throw notFound('Message');
      return { data: presentNotification(row) };
    },
  });

  return router;
}
