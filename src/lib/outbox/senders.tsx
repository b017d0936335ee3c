import { createContext, useCallback, useContext, type ReactNode } from 'react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMe } from '../auth';
import { flushOutbox, type OutboxSender } from './outbox';

// Each kind of queued work is sent by its own feature (a walkaround uploads its photos first);
// the app puts the senders here, so a feature's "Try sending now" runs the whole queue in order.

export type OutboxSenders = Record<string, (queryClient: QueryClient) => OutboxSender>;

const SendersContext = createContext<OutboxSenders>({});

export function OutboxSendersProvider({
  senders,
  children,
}: {
  senders: OutboxSenders;
  children: ReactNode;
}) {
  return <SendersContext value={senders}>{children}</SendersContext>;
}

/** Sends the signed-in person's queue now; answers how many entries went out. */
export function useFlushOutbox(): () => Promise<number> {
  const senders = useContext(SendersContext);
  const queryClient = useQueryClient();
  const userId = useMe().data?.user.id;
  return useCallback(async () => {
    if (!userId) return 0;
    const made = Object.fromEntries(
      Object.entries(senders).map(([kind, make]) => [kind, make(queryClient)]),
    );
    return flushOutbox(userId, made);
  }, [senders, queryClient, userId]);
}
