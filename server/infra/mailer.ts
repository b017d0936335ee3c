import nodemailer, { type Transporter } from 'nodemailer';
import { QueryTypes, type Transaction } from 'sequelize';
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

/** Minutes to wait before attempt n+1 after n failed ones (exponential, capped at an hour). */
export const backoffMinutes = (attempts: number) => Math.min(60, 2 ** attempts);

/** An SMTP transport with short timeouts, so a hung mail server fails an attempt in seconds. */
export function createMailTransport(url = env.SMTP_URL): Transporter {
  return nodemailer.createTransport(
    {
      url,
      connectionTimeout: env.SMTP_CONNECTION_TIMEOUT_MS,
      greetingTimeout: env.SMTP_GREETING_TIMEOUT_MS,
      socketTimeout: env.SMTP_SOCKET_TIMEOUT_MS,
    },
    { from: env.MAIL_FROM },
  );
}

let transport: Transporter | null = null;
const defaultTransport = () => (transport ??= createMailTransport());

const appHost = new URL(env.APP_URL).hostname;
const MESSAGE_ID_HOST = /^[A-Za-z0-9.-]+$/.test(appHost) ? appHost : 'hourstone.local';

/**
 * The Message-ID header of a notification: the same on every attempt, so a message sent again
 * after a worker died between sending and recording it is recognisably the same message.
 */
export const messageIdOf = (notificationId: string) => `<${notificationId}@${MESSAGE_ID_HOST}>`;

/**
 * Writes the message to the outbox, inside the caller's transaction when one is given (the
 * message then exists exactly when the change it announces does). Returns null when a message
 * with the same identity exists already (nothing is queued twice). Delivery is the worker's job:
 * a trigger notifies the workers when the row commits.
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

// The database's clock decides (workers on several hosts need not agree on the time); tests
// may pass a fixed :now instead.
const CLOCK = `coalesce(CAST(:now AS timestamptz), now())`;
const DUE = `((status = 'queued' AND next_attempt_at <= ${CLOCK})
  OR (status = 'sending' AND claimed_until <= ${CLOCK} AND attempts < :max))`;

/**
 * Claims the next message that is due — queued and past its next attempt, or left `sending` by a
 * worker whose lease has run out — as `sending` with attempts + 1 and a lease, and commits that
 * before returning. SKIP LOCKED: workers claiming at the same moment take different rows.
 */
export async function claimNextMessage(now?: Date): Promise<Notification | null> {
  const rows = await sequelize.query<{ id: string }>(
    `UPDATE notifications
     SET status = 'sending', attempts = attempts + 1, claimed_at = ${CLOCK},
         claimed_until = ${CLOCK} + make_interval(secs => :lease), updated_at = now()
     WHERE id = (SELECT id FROM notifications WHERE ${DUE}
                 ORDER BY next_attempt_at, id LIMIT 1 FOR UPDATE SKIP LOCKED)
       AND ${DUE}
     RETURNING id`,
    {
      replacements: { now: now ?? null, max: MAX_ATTEMPTS, lease: env.MAIL_CLAIM_LEASE_SECONDS },
      type: QueryTypes.SELECT,
    },
  );
  return rows.length ? Notification.findByPk(rows[0].id) : null;
}

/** A claim whose last allowed attempt was interrupted (the worker died) ends as failed. */
async function failInterruptedLastAttempts(now?: Date) {
  await sequelize.query(
    `UPDATE notifications
     SET status = 'failed', claimed_until = NULL, updated_at = now(),
         last_error = 'The last attempt was interrupted (the worker stopped while sending)'
     WHERE status = 'sending' AND claimed_until <= ${CLOCK} AND attempts >= :max`,
    { replacements: { now: now ?? null, max: MAX_ATTEMPTS } },
  );
}

/** One SMTP conversation for a claimed message; no database transaction is open meanwhile. */
export async function transmit(row: Notification, via: Transporter = defaultTransport()) {
  await via.sendMail({
    to: row.recipient,
    subject: row.subject,
    text: row.textBody,
    html: row.htmlBody ?? undefined,
    headers: row.headers,
    messageId: messageIdOf(row.id),
  });
}

async function recordSent(row: Notification, now?: Date) {
  await sequelize.query(
    `UPDATE notifications
     SET status = 'sent', sent_at = ${CLOCK}, last_error = NULL, claimed_until = NULL,
         updated_at = now()
     WHERE id = :id AND status <> 'sent'`,
    { replacements: { id: row.id, now: now ?? null } },
  );
}

/** Back to queued with the backoff, or failed after the last attempt — if the claim still holds. */
async function recordFailure(row: Notification, error: Error, now?: Date) {
  const failed = row.attempts >= MAX_ATTEMPTS;
  await sequelize.query(
    `UPDATE notifications
     SET status = :status, last_error = :error, claimed_until = NULL, updated_at = now(),
         next_attempt_at = ${CLOCK} + make_interval(mins => :wait)
     WHERE id = :id AND status = 'sending' AND attempts = :attempts`,
    {
      replacements: {
        id: row.id,
        attempts: row.attempts,
        status: failed ? 'failed' : 'queued',
        error: error.message.slice(0, 500),
        wait: backoffMinutes(row.attempts),
        now: now ?? null,
      },
    },
  );
  return failed;
}

/** The server itself is unreachable or unavailable (not this message's fault). */
function serverUnavailable(error: unknown) {
  const e = error as { code?: string; command?: string; responseCode?: number };
  return (
    e.command === 'CONN' ||
    e.responseCode === 421 ||
    ['ECONNECTION', 'ETIMEDOUT', 'ESOCKET', 'EDNS'].includes(e.code ?? '')
  );
}

export interface DeliveryOptions {
  /** most messages to send in this run */
  limit?: number;
  /** a fixed clock (tests); by default the database's time at each step */
  now?: Date;
  transport?: Transporter;
  /** stops the run before the next message (worker shutdown) */
  signal?: AbortSignal;
}

/**
 * Sends the messages whose time has come, one at a time: claim (committed as `sending`), SMTP
 * outside any transaction, then `sent` committed. A crash in between leaves the claim to expire,
 * and the message is sent again with the same Message-ID: at least once, never lost. When the
 * server is unreachable the run stops after that attempt; the rest wait for the next run.
 */
export async function deliverQueued(options: DeliveryOptions = {}) {
  const result = { sent: 0, failed: 0, retrying: 0 };
  const { now } = options;
  await failInterruptedLastAttempts(now);
  for (let i = 0; i < (options.limit ?? 50) && !options.signal?.aborted; i++) {
    const row = await claimNextMessage(now);
    if (!row) break;
    try {
      await transmit(row, options.transport);
    } catch (err) {
      const error = err as Error;
      if (await recordFailure(row, error, now)) result.failed++;
      else result.retrying++;
      logger.warn(
        { id: row.id, attempts: row.attempts, err: error.message },
        'mail delivery failed',
      );
      if (serverUnavailable(err)) break;
      continue;
    }
    await recordSent(row, now);
    result.sent++;
  }
  return result;
}
