import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useMe } from '../../../lib/auth';
import { changedByWalkaround, walkaroundKeys } from '../api/keys';
import { submitWalkaround } from '../api/submit-walkaround';
import { flushOutbox } from './outbox';

/** Sends the signed-in person's queued walkarounds now; what they changed is fetched again. */
export function useFlushOutbox(): () => Promise<number> {
  const queryClient = useQueryClient();
  const userId = useMe().data?.user.id;
  return useCallback(async () => {
    if (!userId) return 0;
    const sent = await flushOutbox(userId, submitWalkaround);
    if (sent > 0) {
      queryClient.removeQueries({ queryKey: walkaroundKeys.checklists() });
      await Promise.all(
        [walkaroundKeys.allMachines(), ...changedByWalkaround].map((queryKey) =>
          queryClient.invalidateQueries({ queryKey }),
        ),
      );
    }
    return sent;
  }, [queryClient, userId]);
}
