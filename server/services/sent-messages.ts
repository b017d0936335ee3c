// "Sent messages": an organization's outbox as its managers read it.
import { sequelize } from '../db';
import { notFound } from '../errors';
import { Notification } from '../models';
import type { OrgAccess } from '../policies/context';
import {
  NOTIFICATION_STATUSES,
  type NotificationListQuery,
  type NotificationStatusName,
} from '../../shared/schemas/notifications';

/**
 * One page of the outbox (newest first, without the bodies), the count of each status, and the
 * total of the status asked for (or of all).
 */
export async function listSentMessages(access: OrgAccess, query: NotificationListQuery) {
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
  return { rows, counts, total };
}

/** One message of the organization's outbox with its content, or 404. */
export async function loadSentMessage(access: OrgAccess, id: string) {
  const row = await Notification.findOne({
    where: { id, organizationId: access.organization.id },
  });
  if (!row) throw notFound('Message');
  return row;
}
