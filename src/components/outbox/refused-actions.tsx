import { useState } from 'react';
import { discard, sendAgain, type OutboxEntry } from '../../lib/outbox/outbox';
import { useFlushOutbox } from '../../lib/outbox/senders';
import { Button } from '../ui/button';
import { ConfirmDialog } from '../ui/confirm-dialog';

/**
 * What a person may do with work the server refused: send it again (after fixing what the reason
 * names, e.g. the machine returned to service), or throw it away, after saying so.
 */
export function RefusedActions({
  entry,
  discardLabel = 'Discard',
  onDiscarded,
}: {
  entry: OutboxEntry;
  discardLabel?: string;
  onDiscarded?: () => void;
}) {
  const flush = useFlushOutbox();
  const [asking, setAsking] = useState(false);
  return (
    <span className="flex flex-wrap items-center gap-2">
      <Button
        variant="secondary"
        icon="refresh"
        className="min-h-12"
        onClick={() => void sendAgain(entry.id).then(flush)}
      >
        Send again
      </Button>
      <Button variant="ghost" className="min-h-12" onClick={() => setAsking(true)}>
        {discardLabel}
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Discard the ${entry.label}?`}
        confirmLabel="Discard"
        onCancel={() => setAsking(false)}
        onConfirm={() => {
          setAsking(false);
          void discard(entry.id).then(() => onDiscarded?.());
        }}
      >
        <p>It was never recorded in Hourstone. Once discarded it cannot be sent again.</p>
      </ConfirmDialog>
    </span>
  );
}
