import { deliverQueued } from '../server/services/mailer';

/** Sends queued e-mail whose time has come (retries with backoff are decided by the mailer). */
export async function perform() {
  // Rows are claimed with SKIP LOCKED, so no job-wide lock is needed for several workers.
  return deliverQueued({ limit: 200 });
}
