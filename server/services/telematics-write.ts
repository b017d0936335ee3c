// Readings that arrive with an organization API key, written through the same rules as any other
// (planReadings, storePlannedReadings of readings.ts), one answer per reading: recorded, already there (an identical resend adds
// nothing), or refused with the rule's reason — a refused reading does not hold back the rest.
import type { Transaction } from 'sequelize';
import type { Machine } from '../models';
import type { KeyContext, MemberAccess } from '../policies/context';
import { apiKeySource } from '../../shared/domain/telematics-source';
import { planReadings, storePlannedReadings } from './readings';

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
 * Writes the readings in the caller's transaction, whose machines it has locked (FOR UPDATE),
 * set-based however many machines they are on: one plan of them all (planReadings: every meter's
 * context in one statement, the same rules as any reading), the refused ones set aside with their
 * reasons, and the rest written with their summaries and forecasts in one statement
 * (storePlannedReadings). A refused reading does not hold back the rest, and leaving it out
 * changes no other outcome: each reading is checked against the accepted ones only.
 */
export async function recordTelematicsReadings(
  key: KeyContext,
  items: TelematicsReading[],
  transaction: Transaction,
): Promise<TelematicsOutcome[]> {
  const outcomes: TelematicsOutcome[] = items.map(() => ({ status: 'refused', reason: '' }));
  if (!items.length) return outcomes;
  const importKey = apiKeySource(key.keyPrefix, key.keyName);
  const access = keyWriter(key);
  const plan = await planReadings(
    access,
    items.map((item) => ({ ...item, source: 'telematics' as const, importKey })),
    transaction,
    { locked: true, fieldPrefix: (j) => `${j}.` },
  );
  for (const [place, reason] of refusalsOf(plan.errors))
    outcomes[place] = { status: 'refused', reason };
  const written = await storePlannedReadings(access, plan, transaction);
  for (const o of written)
    outcomes[o.index] = { status: o.status === 'added' ? 'recorded' : 'already_there' };
  return outcomes;
}

/** The refusals of a plan (fields `<place>.<field>`) by place, a place's messages joined. */
function refusalsOf(errors: Record<string, string>): Map<number, string> {
  const refused = new Map<number, string>();
  for (const [field, message] of Object.entries(errors)) {
    const place = Number(field.split('.')[0]);
    refused.set(place, refused.has(place) ? `${refused.get(place)}; ${message}` : message);
  }
  return refused;
}
