import { useEffect, type ReactNode } from 'react';
import { READINGS_KIND, readingsSender } from '../features/readings/lib/queued-readings';
import { WALKAROUND_KIND, walkaroundSender } from '../features/walkarounds/lib/queued-walkarounds';
import { useMe } from '../lib/auth';
import { OutboxSendersProvider, useFlushOutbox, type OutboxSenders } from '../lib/outbox/senders';
import { useOutbox } from '../lib/outbox/use-outbox';

const SENDERS: OutboxSenders = {
  [WALKAROUND_KIND]: walkaroundSender,
  [READINGS_KIND]: readingsSender,
};

const RETRY_MS = 30_000;

/**
 * Sends the work saved on this phone: when the app starts, when something is queued while
 * online, when the browser says the connection is back, and every half minute while some wait
 * (the `online` event does not fire when the network is up but the server is not).
 */
function SendWhenOnline() {
  const flush = useFlushOutbox();
  const userId = useMe().data?.user.id;
  const { entries } = useOutbox();
  const waiting = entries.filter((e) => e.userId === userId && e.state === 'waiting').length;

  useEffect(() => {
    const send = () => void flush();
    window.addEventListener('online', send);
    return () => window.removeEventListener('online', send);
  }, [flush]);

  useEffect(() => {
    if (waiting === 0) return;
    if (navigator.onLine) void flush();
    const timer = window.setInterval(() => {
      if (navigator.onLine) void flush();
    }, RETRY_MS);
    return () => window.clearInterval(timer);
  }, [waiting, flush]);

  return null;
}

/** Every organization page: the senders of each kind of queued work, and the sending itself. */
export function OutboxSender({ children }: { children: ReactNode }) {
  return (
    <OutboxSendersProvider senders={SENDERS}>
      <SendWhenOnline />
      {children}
    </OutboxSendersProvider>
  );
}
