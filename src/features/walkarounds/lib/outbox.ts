import type { WalkaroundCreateInput } from '../../../../shared/schemas/walkarounds';
import { isApiError } from '../../../lib/api-client';
import type { WalkaroundOutcome } from '../api/types';
import { readJson, writeJson } from './storage';

// Walkarounds finished without a connection wait here (localStorage, so they survive a reload
// or a flat phone) and go out when the connection returns. Each carries the clientId made when
// the walkaround started: a resend the server already has answers duplicate: true and counts as
// sent, so a reply lost on the way back never doubles a walkaround.

export interface QueuedWalkaround {
  clientId: string;
  orgId: string;
  /** who did it: only their own session sends it */
  userId: string;
  machine: { id: string; fleetNumber: string; name: string };
  input: WalkaroundCreateInput;
  queuedAt: string;
  /** waiting: goes out with the connection; refused: the server said no, `error` says why */
  state: 'waiting' | 'refused';
  error: string | null;
}

export interface OutboxSnapshot {
  items: readonly QueuedWalkaround[];
  /** answers to the walkarounds sent from the queue since the app started, by clientId */
  sent: ReadonlyMap<string, WalkaroundOutcome>;
  sending: boolean;
}

/** The storage key of the queue (the browser tests read it). */
export const OUTBOX_KEY = 'hourstone.walkaround.outbox';

const stored = () => readJson<QueuedWalkaround[]>(OUTBOX_KEY) ?? [];

let snapshot: OutboxSnapshot = { items: stored(), sent: new Map(), sending: false };
const listeners = new Set<() => void>();

function publish(next: Partial<OutboxSnapshot>) {
  snapshot = { ...snapshot, ...next };
  for (const listener of listeners) listener();
}

/** Read-modify-write of the stored queue, so another tab's additions are kept. */
function updateItems(change: (items: QueuedWalkaround[]) => QueuedWalkaround[]) {
  const items = change(stored());
  writeJson(OUTBOX_KEY, items);
  publish({ items });
}

// Another tab queued or sent one: show the stored queue.
const onStorage = (event: StorageEvent) => {
  if (event.key === OUTBOX_KEY) publish({ items: stored() });
};

export function subscribeOutbox(listener: () => void): () => void {
  if (listeners.size === 0) window.addEventListener('storage', onStorage);
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
    if (listeners.size === 0) window.removeEventListener('storage', onStorage);
  };
}

export const outboxSnapshot = () => snapshot;

/** false when the phone could not store it (storage full or blocked). */
export function enqueueWalkaround(item: Omit<QueuedWalkaround, 'state' | 'error'>): boolean {
  const entry: QueuedWalkaround = { ...item, state: 'waiting', error: null };
  const items = [...stored().filter((i) => i.clientId !== item.clientId), entry];
  const saved = writeJson(OUTBOX_KEY, items);
  publish({ items: saved ? items : [...snapshot.items, entry] });
  return saved;
}

export function discardQueued(clientId: string): void {
  updateItems((items) => items.filter((i) => i.clientId !== clientId));
}

type Send = (orgId: string, input: WalkaroundCreateInput) => Promise<WalkaroundOutcome>;

// Worth trying again later: no connection, a server not answering, the session to renew.
const isTransient = (error: unknown) =>
  !isApiError(error) ||
  error.code === 'unreachable' ||
  error.status === 401 ||
  error.status === 429 ||
  error.status >= 500;

function refusalText(error: unknown): string {
  if (!isApiError(error)) return 'Hourstone refused this walkaround.';
  const fields = Object.values(error.fields);
  return fields.length ? `${error.message} ${fields.join(' ')}` : error.message;
}

let running: Promise<number> | null = null;

/**
 * Sends the signed-in person's waiting walkarounds, oldest first; stops at the first one that
 * fails for want of a connection. One run at a time; answers how many went out.
 */
export function flushOutbox(userId: string, send: Send): Promise<number> {
  if (running) return running;
  running = (async () => {
    const waiting = stored().filter((i) => i.userId === userId && i.state === 'waiting');
    if (waiting.length === 0) return 0;
    publish({ sending: true });
    let sentCount = 0;
    for (const item of waiting) {
      try {
        const outcome = await send(item.orgId, item.input);
        const sent = new Map(snapshot.sent).set(item.clientId, outcome);
        snapshot = { ...snapshot, sent };
        updateItems((items) => items.filter((i) => i.clientId !== item.clientId));
        sentCount += 1;
      } catch (error) {
        if (isTransient(error)) break;
        const message = refusalText(error);
        updateItems((items) =>
          items.map((i) =>
            i.clientId === item.clientId ? { ...i, state: 'refused', error: message } : i,
          ),
        );
      }
    }
    return sentCount;
  })().finally(() => {
    running = null;
    publish({ sending: false });
  });
  return running;
}
