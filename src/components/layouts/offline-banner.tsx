import { useSyncExternalStore } from 'react';
import { useMe } from '../../lib/auth';
import { useOutbox } from '../../lib/outbox/use-outbox';
import { Icon } from '../ui/icons';

const subscribe = (listener: () => void) => {
  window.addEventListener('online', listener);
  window.addEventListener('offline', listener);
  return () => {
    window.removeEventListener('online', listener);
    window.removeEventListener('offline', listener);
  };
};

/** navigator.onLine, kept current by the browser's online and offline events. */
export const useOnline = () =>
  useSyncExternalStore(
    subscribe,
    () => navigator.onLine,
    () => true,
  );

/** Says plainly that there is no connection, and how much of this person's work waits to go. */
export function OfflineBanner() {
  const online = useOnline();
  const userId = useMe().data?.user.id;
  const { entries } = useOutbox();
  if (online) return null;
  const waiting = entries.filter((e) => e.userId === userId && e.state === 'waiting').length;
  return (
    <div
      role="status"
      className="fixed left-1/2 top-2 z-50 flex max-w-[calc(100vw-1rem)] -translate-x-1/2 items-center gap-2 rounded-full border-2 border-sky-400 bg-sky-50 px-4 py-2 text-sky-900 shadow-card print:hidden"
    >
      <Icon name="info" className="size-5 shrink-0" />
      <span>
        You&rsquo;re offline.{' '}
        {waiting === 0
          ? 'What you do is kept on this phone.'
          : `${waiting} ${waiting === 1 ? 'item waits' : 'items wait'} to be sent.`}
      </span>
    </div>
  );
}
