// Readings that arrive with an organization API key, written through the same rules as any other
// (writeReadings), one answer per reading: recorded, already there (an identical resend adds
// nothing), or refused with the rule's reason — a refused reading does not hold back the rest.
import type { Transaction } from 'sequelize';
import { AppError } from '../errors';
import type { Machine } from '../models';
import type { KeyContext, MemberAccess } from '../policies/context';
import { apiKeySource } from '../../shared/domain/telematics-source';
import { writeReadings } from './readings';

export interface TelematicsReading {
  machine: Machine;
  /** the machine's meter the hours go on (its engine-hours meter, else its primary) */
  meterId: string;
  /** engine hours, as the machine's meter shows them */
  value: number;
  takenAt: Date;
}

export type TelematicsOutcome =
  { status: 'recorded' | 'already_there' } | { status: 'refused'; reason: string };

/**
 * How a key writes: for its organization, in the name of whoever made it (null once that account
 * is gone). No policy reads this role: the key's routes decide what it may do (scope, sold
 * machines), and writeReadings reads only the organization and the person.
 */
export const keyWriter = (key: KeyContext): MemberAccess => ({
  organization: key.organization,
  userId: key.createdBy as string,
  role: 'manager',
  via: 'member',
});

/**
 * Writes the readings in the caller's transaction, whose machines it has locked (FOR UPDATE).
 * writeReadings refuses a batch with any broken rule and writes nothing; the refused readings
 * are then set aside with their reasons and the rest is sent again (a refusal can only shrink
 * the batch, so this ends).
 */
export async function recordTelematicsReadings(
  key: KeyContext,
  items: TelematicsReading[],
  transaction: Transaction,
): Promise<TelematicsOutcome[]> {
  const outcomes: TelematicsOutcome[] = items.map(() => ({ status: 'refused', reason: '' }));
  const importKey = apiKeySource(key.keyPrefix, key.keyName);
  let pending = items.map((_, i) => i);
  while (pending.length) {
    try {
      const written = await writeReadings(
        keyWriter(key),
        pending.map((i) => ({ ...items[i], source: 'telematics' as const, importKey })),
        transaction,
        { locked: true, fieldPrefix: (j) => `${j}.` },
      );
      for (const o of written)
        outcomes[pending[o.index]] = {
          status: o.status === 'added' ? 'recorded' : 'already_there',
        };
      break;
    } catch (err) {
      const refused = refusedOf(err, pending.length);
      if (!refused) throw err;
      for (const [j, reason] of refused) outcomes[pending[j]] = { status: 'refused', reason };
      pending = pending.filter((_, j) => !refused.has(j));
    }
  }
  return outcomes;
}

/** The batch places a 422 of writeReadings names (`<place>.<field>`), with their messages. */
function refusedOf(err: unknown, count: number): Map<number, string> | null {
  if (!(err instanceof AppError) || err.status !== 422 || !err.fields) return null;
  const refused = new Map<number, string>();
  for (const [field, message] of Object.entries(err.fields)) {
    const place = Number(field.split('.')[0]);
    if (!Number.isInteger(place) || place < 0 || place >= count) return null;
    refused.set(place, refused.has(place) ? `${refused.get(place)}; ${message}` : message);
  }
  return refused.size ? refused : null;
}
