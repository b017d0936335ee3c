import { formatDateTime } from '../../lib/format';
import { useFlushOutbox } from '../../lib/outbox/senders';
import { useOutbox } from '../../lib/outbox/use-outbox';
import { Button } from '../ui/button';
import { Icon } from '../ui/icons';
import { RefusedActions } from './refused-actions';

/** Work saved on this phone and not sent yet (or refused), for this person and farm. */
export function OutboxPanel({
  orgId,
  userId,
  timeZone,
}: {
  orgId: string;
  userId: string;
  timeZone: string;
}) {
  const { entries, sending } = useOutbox();
  const flush = useFlushOutbox();
  const mine = entries.filter((entry) => entry.orgId === orgId && entry.userId === userId);
  if (mine.length === 0) return null;
  const waiting = mine.filter((entry) => entry.state === 'waiting');

  return (
    <section
      aria-labelledby="outbox-heading"
      className="flex flex-col gap-3 rounded-xl border-2 border-sky-300 bg-sky-50 p-4 text-sky-900"
    >
      <h2 id="outbox-heading" className="flex items-center gap-2 font-black">
        <Icon name="info" className="size-5" />
        Saved on this phone, not sent yet
      </h2>
      <ul className="flex flex-col gap-2">
        {mine.map((entry) => (
          <li key={entry.id} className="flex flex-col gap-1">
            <span>
              <span className="font-bold">{entry.label}</span>
              {' · '}
              {formatDateTime(entry.queuedAt, timeZone)}
              {entry.state === 'waiting' ? ' · waiting for a connection' : null}
            </span>
            {entry.state === 'refused' ? (
              <>
                <span className="font-bold text-poppy-800">Not accepted: {entry.error}</span>
                <RefusedActions entry={entry} />
              </>
            ) : null}
          </li>
        ))}
      </ul>
      {waiting.length > 0 ? (
        <Button
          variant="secondary"
          icon="refresh"
          className="min-h-12 self-start"
          pending={sending}
          onClick={() => void flush()}
        >
          Try sending now
        </Button>
      ) : null}
    </section>
  );
}
