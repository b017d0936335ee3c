import nodemailer, { type Transporter } from 'nodemailer';
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { logger } from '../logger';
import { Notification } from '../models';

export interface OutgoingMessage {
  organizationId: string | null;
  recipient: string;
  /** what sort of message: 'invitation', 'password_reset', 'due_digest' … */
  kind: string;
  /** with organization, recipient and kind, identifies the message: the same key is never sent twice */
  periodKey: string;
  subject: string;
  text: string;
  html?: string;
  headers?: Record<string, string>;
}

export const MAX_ATTEMPTS = 6;

let transport: Transporter | null = null;
function getTransport(): Transporter {
  transport ??= nodemailer.createTransport(env.SMTP_URL, { from: env.MAIL_FROM });
  return transport;
}

/**
 * Writes the message to the outbox. Returns null when a message with the same identity exists
 * already (nothing is queued twice).
 */
export async function queueMessage(
  message: OutgoingMessage,
  transaction?: Transaction,
): Promise<Notification | null> {
  const [rows] = (await sequelize.query(
    `INSERT INTO notifications (organization_id, recipient, kind, period_key, subject, text_body, html_body, headers)
     VALUES (:organizationId, :recipient, :kind, :periodKey, :subject, :text, :html, :headers)
     ON CONFLICT DO NOTHING RETURNING id`,
    {
      replacements: {
        ...message,
        recipient: message.recipient.toLowerCase(),
        html: message.html ?? null,
        headers: JSON.stringify(message.headers ?? {}),
      },
      transaction,
    },
  )) as [{ id: string }[], unknown];
  if (!rows.length) return null;
  return Notification.findByPk(rows[0].id, { transaction });
}

/** Minutes to wait before attempt n+1 (exponential, capped at an hour). */
export const backoffMinutes = (attempts: number) => Math.min(60, 2 ** attempts);

/**
 * Sends queued messages whose time has come. Rows are claimed with FOR UPDATE SKIP LOCKED inside
 * a transaction, so several workers at once never send the same message.
 */
export async function deliverQueued(options: { ids?: string[]; limit?: number } = {}): Promise<{
  sent: number;
  failed: number;
  retrying: number;
}> {
  const result = { sent: 0, failed: 0, retrying: 0 };
  const limit = options.limit ?? 50;
  for (let i = 0; i < limit; i++) {
    const done = await sequelize.transaction(async (transaction) => {
      const row = await Notification.findOne({
        where: {
          status: 'queued',
          nextAttemptAt: { [Op.lte]: new Date() },
          ...(options.ids && { id: { [Op.in]: options.ids } }),
        },
        order: [['nextAttemptAt', 'ASC']],
        lock: transaction.LOCK.UPDATE,
        skipLocked: true,
        transaction,
      });
      if (!row) return false;
      try {
        await getTransport().sendMail({
          to: row.recipient,
          subject: row.subject,
          text: row.textBody,
          html: row.htmlBody ?? undefined,
          headers: row.headers,
        });
        await row.update(
          { status: 'sent', sentAt: new Date(), attempts: row.attempts + 1, lastError: null },
          { transaction },
        );
        result.sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        const failed = attempts >= MAX_ATTEMPTS;
        await row.update(
          {
            attempts,
            status: failed ? 'failed' : 'queued',
            lastError: (err as Error).message.slice(0, 500),
            nextAttemptAt: new Date(Date.now() + backoffMinutes(attempts) * 60_000),
          },
          { transaction },
        );
        if (failed) result.failed++;
        else result.retrying++;
        logger.warn({ id: row.id, attempts, err: (err as Error).message }, 'mail delivery failed');
      }
      return true;
    });
    if (!done) break;
  }
  return result;
}

/** Queues a message and tries to send it at once; a failure leaves it queued for the worker. */
export async function sendNow(message: OutgoingMessage): Promise<Notification | null> {
  const row = await queueMessage(message);
  if (row) await deliverQueued({ ids: [row.id], limit: 1 });
  return row;
}
