import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useMe } from '../../../lib/auth';
import { submitWalkaround } from '../api/submit-walkaround';
import { flushOutbox } from './outbox';
import { changedBy, invalidate } from '../../../lib/invalidation';
import { queryKeys } from '../../../lib/query-keys';

/** Sends the signed-in person's queued walkarounds now; what they changed is fetched again. */
export function useFlushOutbox(): () => Promise<number> {
  const queryClient = useQueryClient();
  const userId = useMe().data?.user.id;
  return useCallback(async () => {
    if (!userId) return 0;
    // the queue may hold walkarounds of several farms: each one's keys go stale
    const farms = new Set<string>();
    const sent = await flushOutbox(userId, (orgId, input) =>
      submitWalkaround(orgId, input).then((outcome) => {
        farms.add(orgId);
        return outcome;
      }),
    );
    for (const orgId of farms) {
      queryClient.removeQueries({ queryKey: queryKeys.walkarounds.checklists(orgId) });
      await invalidate(queryClient, changedBy.walkaround(orgId));
    }
    return sent;
  }, [queryClient, userId]);
}
