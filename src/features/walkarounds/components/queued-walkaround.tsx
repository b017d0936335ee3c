import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import type { WalkaroundOutcome } from '../api/types';
import { discardQueued } from '../lib/outbox';
import { useFlushOutbox } from '../lib/use-flush-outbox';
import { useOutbox } from '../lib/use-outbox';
import { WalkaroundOutcomeView } from './walkaround-outcome';

export const SAVED_ON_PHONE = 'Saved on this phone — it will be sent when the connection returns';

/**
 * A walkaround finished without a connection: saved on the phone and waiting. Turns into the
 * server's answer as soon as the queue sends it (the `online` event, or "Send now").
 */
export function QueuedWalkaround({
  clientId,
  fleetNumber,
  photosLeftOut,
  pickHref,
  defectsHref,
  onDiscarded,
}: {
  clientId: string;
  fleetNumber: string;
  photosLeftOut: number;
  pickHref: string;
  defectsHref: string;
  onDiscarded: () => void;
}) {
  const { items, sent, sending } = useOutbox();
  const flush = useFlushOutbox();
  const outcome: WalkaroundOutcome | undefined = sent.get(clientId);
  const queued = items.find((item) => item.clientId === clientId);

  if (outcome)
    return (
      <WalkaroundOutcomeView outcome={outcome} pickHref={pickHref} defectsHref={defectsHref} />
    );

  if (!queued) {
    // sent from another window of this phone: the answer is there, not here
    return (
      <div role="status" className="rounded-xl border-2 border-clover-300 bg-clover-50 p-5">
        <p className="text-xl font-black text-clover-900">Walkaround sent</p>
        <p className="text-clover-900">The walkaround of {fleetNumber} has reached Hourstone.</p>
      </div>
    );
  }

  if (queued.state === 'refused') {
    return (
      <div className="flex flex-col gap-4">
        <div role="alert" className="rounded-xl border-2 border-poppy-300 bg-poppy-50 p-4">
          <p className="font-black text-poppy-900">Hourstone did not accept this walkaround</p>
          <p className="text-poppy-900">{queued.error}</p>
        </div>
        <Button
          variant="secondary"
          className="min-h-12"
          onClick={() => {
            discardQueued(clientId);
            onDiscarded();
          }}
        >
          Discard it and start again
        </Button>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <div
        role="status"
        className="flex gap-3 rounded-xl border-2 border-sky-300 bg-sky-50 p-5 text-sky-900"
      >
        <Icon name="info" className="mt-0.5 size-7 shrink-0 text-sky-700" />
        <div className="flex flex-col gap-1">
          <p className="text-lg font-black">{SAVED_ON_PHONE}</p>
          <p>
            The walkaround of {fleetNumber} keeps the time you did it. Keep this page or come back
            later: it goes out by itself, only once.
          </p>
          {photosLeftOut > 0 ? (
            <p className="font-bold">
              {photosLeftOut === 1
                ? '1 photo could not be uploaded without a connection and was left out; your notes go with it.'
                : `${photosLeftOut} photos could not be uploaded without a connection and were left out; your notes go with them.`}
            </p>
          ) : null}
        </div>
      </div>
      <Button
        variant="secondary"
        icon="refresh"
        className="min-h-12"
        pending={sending}
        onClick={() => void flush()}
      >
        Try sending now
      </Button>
      <p className="text-sm text-field-600">
        Do not start another walkaround of {fleetNumber} for the same check: this one is on its way.
      </p>
    </div>
  );
}
