import { useEffect } from 'react';
import { useMe } from '../../../lib/auth';
import { useFlushOutbox } from '../lib/use-flush-outbox';
import { useOutbox } from '../lib/use-outbox';

const RETRY_MS = 30_000;

/**
 * Sends walkarounds saved on this phone: when the app starts, when the browser says the
 * connection is back, and every half minute while some wait (the `online` event does not fire
 * when the network is up but the server is not). Renders nothing; mounted once for every
 * organization page.
 */
export function WalkaroundOutboxSender() {
  const flush = useFlushOutbox();
  const userId = useMe().data?.user.id;
  const { items } = useOutbox();
  const waiting = items.some((item) => item.userId === userId && item.state === 'waiting');

  useEffect(() => {
    const send = () => void flush();
    send();
    window.addEventListener('online', send);
    return () => window.removeEventListener('online', send);
  }, [flush]);

  useEffect(() => {
    if (!waiting) return;
    const timer = window.setInterval(() => {
      if (navigator.onLine) void flush();
    }, RETRY_MS);
    return () => window.clearInterval(timer);
  }, [waiting, flush]);

  return null;
}
