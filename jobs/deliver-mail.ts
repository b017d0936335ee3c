import { deliverQueued, type DeliveryOptions } from '../server/infra/mailer';

/**
 * Sends queued e-mail whose time has come (retries with backoff are decided by the mailer). Rows
 * are claimed one at a time with SKIP LOCKED, so no job-wide lock is needed for several workers.
 */
export async function perform(now?: Date, options: Omit<DeliveryOptions, 'now'> = {}) {
  return deliverQueued({ limit: 200, ...options, now });
}
