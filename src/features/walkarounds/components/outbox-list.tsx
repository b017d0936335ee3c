import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { formatDateTime } from '../../../lib/format';
import { discardQueued } from '../lib/outbox';
import { useFlushOutbox } from '../lib/use-flush-outbox';
import { useOutbox } from '../lib/use-outbox';

/** Walkarounds saved on this phone and not sent yet (or refused), for this person and farm. */
export function OutboxList({
  orgId,
  userId,
  timeZone,
}: {
  orgId: string;
  userId: string;
  timeZone: string;
}) {
  const { items, sending } = useOutbox();
  const flush = useFlushOutbox();
  const mine = items.filter((item) => item.orgId === orgId && item.userId === userId);
  if (mine.length === 0) return null;
  const waiting = mine.filter((item) => item.state === 'waiting');

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
        {mine.map((item) => (
          <li key={item.clientId} className="flex flex-col gap-1">
            <span>
              <span className="font-bold">{item.machine.fleetNumber}</span>
              {' · '}
              {formatDateTime(item.input.performedAt ?? item.queuedAt, timeZone)}
              {item.state === 'waiting' ? ' · waiting for a connection' : null}
            </span>
            {item.state === 'refused' ? (
              <span className="flex flex-wrap items-center gap-2">
                <span className="font-bold text-poppy-800">Not accepted: {item.error}</span>
                <Button
                  variant="ghost"
                  className="min-h-12"
                  onClick={() => discardQueued(item.clientId)}
                >
                  Discard
                </Button>
              </span>
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
