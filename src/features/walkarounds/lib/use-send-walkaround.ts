import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { WalkaroundCreateInput } from '../../../../shared/schemas/walkarounds';
import { isApiError } from '../../../lib/api-client';
import { submitWalkaround } from '../api/submit-walkaround';
import type { MachineRef, WalkaroundOutcome } from '../api/types';
import { enqueueWalkaround } from './queued-walkarounds';
import { changedBy, invalidate } from '../../../lib/invalidation';
import { queryKeys } from '../../../lib/query-keys';

export type SendResult =
  | { kind: 'sent'; outcome: WalkaroundOutcome }
  | { kind: 'queued'; clientId: string; photosWaiting: number };

/**
 * Sends a finished walkaround, or keeps it on the phone with its photos when there is no
 * connection (the browser says it is offline, or the request never reached the server). Errors
 * the server answered (422, 409) are thrown for the form to show.
 */
export function useSendWalkaround({
  orgId,
  userId,
  machine,
  onDone,
}: {
  orgId: string;
  userId: string;
  machine: MachineRef;
  /** the walkaround left the form (sent or queued): the draft can go */
  onDone: () => void;
}) {
  const queryClient = useQueryClient();
  return useCallback(
    async (
      input: WalkaroundCreateInput,
      waitingPhotos: ReadonlyMap<string, File>,
    ): Promise<SendResult> => {
      const queue = async (): Promise<SendResult> => {
        await enqueueWalkaround({
          orgId,
          userId,
          fleetNumber: machine.fleetNumber,
          input,
          photos: waitingPhotos,
        });
        onDone();
        return { kind: 'queued', clientId: input.clientId, photosWaiting: waitingPhotos.size };
      };
      // a photo not uploaded yet goes with the queued walkaround, which uploads it first
      if (!navigator.onLine || waitingPhotos.size > 0) return queue();
      try {
        const outcome = await submitWalkaround(orgId, input);
        onDone();
        // the machine may be tagged out now: its checklist is fetched again on the next visit
        queryClient.removeQueries({ queryKey: queryKeys.walkarounds.checklists(orgId) });
        void invalidate(queryClient, changedBy.walkaround(orgId));
        return { kind: 'sent', outcome };
      } catch (error) {
        if (isApiError(error) && error.code === 'unreachable') return queue();
        throw error;
      }
    },
    [orgId, userId, machine, onDone, queryClient],
  );
}
