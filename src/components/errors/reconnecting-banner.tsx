import { useIsFetching, type Query } from '@tanstack/react-query';
import { isUnavailable } from '../../lib/api-client';
import { useOnline } from '../layouts/offline-banner';
import { Spinner } from '../ui/spinner';

/** A read that failed because the server or its database was away, and is being tried again. */
export const isRetryingUnavailable = (query: Query) =>
  query.state.fetchFailureCount > 0 && isUnavailable(query.state.fetchFailureReason);

/**
 * Says plainly, while reads are retried after a 503 or a dropped connection, that Hourstone is
 * trying again by itself, so a page that stays on its skeleton does not look broken.
 */
export function ReconnectingBanner() {
  const retrying = useIsFetching({ predicate: isRetryingUnavailable });
  const online = useOnline();
  // offline, the offline banner says it (and what waits to be sent)
  if (retrying === 0 || !online) return null;
  return (
    <div
      role="status"
      // Top centre: the phone's navigation bar sits at the bottom and stays usable.
      className="fixed left-1/2 top-2 z-50 flex max-w-[calc(100vw-1rem)] -translate-x-1/2 items-center gap-2 rounded-full border-2 border-straw-400 bg-straw-50 px-4 py-2 text-straw-900 shadow-card print:hidden"
    >
      <Spinner />
      <span>Hourstone&rsquo;s server isn&rsquo;t answering right now. Trying again&hellip;</span>
    </div>
  );
}
