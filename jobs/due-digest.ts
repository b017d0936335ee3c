import { queueDueDigests } from '../server/services/digest';
import { withJobLock } from './lock';

/**
 * Queues each farm's due digests once its local hour reaches the digest hour (the outbox identity
 * — farm, person, 'due_digest', local date or ISO week — makes later runs that day add nothing).
 */
export async function perform(now = new Date()) {
  return withJobLock('due-digest', () => queueDueDigests(now));
}
