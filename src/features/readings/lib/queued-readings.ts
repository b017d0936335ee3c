import type { QueryClient } from '@tanstack/react-query';
import type { BulkReadingsInput } from '../../../../shared/schemas/readings';
import { isApiError } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';
import { enqueue, withFields, type OutboxSender } from '../../../lib/outbox/outbox';
import { newOutboxId } from '../../../lib/outbox/outbox-id';
import { saveReadings } from '../api/save-readings';

// Readings typed on Log hours without a connection wait in the phone's outbox as the request
// body itself (kept as given, so any field of a reading travels through). Each reading carries
// the time it was typed: a resend after a lost answer is the same value at the same time, which
// the server answers as already recorded instead of adding it again.

export const READINGS_KIND = 'readings';

/** Keeps a round of readings on the phone; every reading gets its time now if it had none. */
export function enqueueReadings(item: {
  orgId: string;
  userId: string;
  input: BulkReadingsInput;
  /** fleet numbers in the order of input.readings, for the server's reasons */
  fleetNumbers: string[];
}): Promise<void> {
  const now = new Date().toISOString();
  const count = item.input.readings.length;
  return enqueue({
    id: newOutboxId(),
    kind: READINGS_KIND,
    orgId: item.orgId,
    userId: item.userId,
    label: count === 1 ? `${item.fleetNumbers[0]} reading` : `${count} readings`,
    body: {
      ...item.input,
      readings: item.input.readings.map((reading) => ({
        ...reading,
        takenAt: reading.takenAt ?? now,
      })),
    },
    fleetNumbers: item.fleetNumbers,
    photos: [],
  });
}

export const readingsSender = (queryClient: QueryClient): OutboxSender => ({
  async send(entry) {
    try {
      return await saveReadings(entry.orgId, entry.body as BulkReadingsInput);
    } catch (error) {
      // `readings.2.value` names a row of the body: say which machine instead
      if (!isApiError(error)) throw error;
      const fleet = entry.fleetNumbers ?? [];
      const fields = Object.fromEntries(
        Object.entries(error.fields).map(([key, message]) => {
          const row = /^readings\.(\d+)\./.exec(key);
          const name = row ? fleet[Number(row[1])] : undefined;
          return [key, name ? `${name}: ${message}` : message];
        }),
      );
      throw withFields(error, fields);
    }
  },
  afterSent: (orgId) => invalidate(queryClient, changedBy.readings(orgId)),
});
