import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { RefusedActions } from '../../../components/outbox/refused-actions';
import { useFlushOutbox } from '../../../lib/outbox/senders';
import { useOutbox } from '../../../lib/outbox/use-outbox';
import type { WalkaroundOutcome } from '../api/types';
import { WalkaroundOutcomeView } from './walkaround-outcome';

export const SAVED_ON_PHONE = 'Saved on this phone — it will be sent when the connection returns';

/**
 * A walkaround finished without a connection: saved on the phone and waiting. Turns into the
 * server's answer as soon as the queue sends it (the `online` event, or "Send now").
 */
export function QueuedWalkaround({
  clientId,
  fleetNumber,
  photosWaiting,
  pickHref,
  defectsHref,
  onDiscarded,
}: {
  clientId: string;
  fleetNumber: string;
  photosWaiting: number;
  pickHref: string;
  defectsHref: string;
  onDiscarded: () => void;
}) {
  const { loaded, entries, sent, sending } = useOutbox();
  const flush = useFlushOutbox();
  const outcome = sent.get(clientId) as WalkaroundOutcome | undefined;
  const queued = entries.find((entry) => entry.id === clientId);

  if (outcome)
    return (
      <WalkaroundOutcomeView outcome={outcome} pickHref={pickHref} defectsHref={defectsHref} />
    );

  if (!queued && !loaded) return null;
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
        <RefusedActions
          entry={queued}
          discardLabel="Discard it and start again"
          onDiscarded={onDiscarded}
        />
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
          {photosWaiting > 0 ? (
            <p className="font-bold">
              {photosWaiting === 1
                ? 'Its photo is kept on this phone too and goes with it.'
                : `Its ${photosWaiting} photos are kept on this phone too and go with it.`}
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
