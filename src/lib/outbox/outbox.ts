import { ApiError, isApiError } from '../api-client';
import { deleteEntry, getEntry, putEntry, readEntries, type OutboxEntry } from './outbox-db';
import { migrateStoredWalkarounds } from './outbox-migrate';

// The queue of work done without a connection (walkarounds with their photos, readings), in
// IndexedDB. Each entry carries the id made on the phone, so a resend the server already has is
// answered as a duplicate and counts as sent: a reply lost on the way back never doubles the work.
// Entries go out oldest first; one the server refuses is kept, with its reason, until the person
// sends it again or discards it. Other tabs hear of every change through a BroadcastChannel.

export type { OutboxEntry };

export interface OutboxSnapshot {
  /** false until the stored queue has been read */
  loaded: boolean;
  entries: readonly OutboxEntry[];
  /** answers to the entries sent from the queue since the app started, by id */
  sent: ReadonlyMap<string, unknown>;
  sending: boolean;
}

/** How one kind of entry goes out; `saveProgress` keeps a step done (a photo uploaded). */
export interface OutboxSender {
  send(entry: OutboxEntry, saveProgress: (entry: OutboxEntry) => Promise<void>): Promise<unknown>;
  /** after a run, once per organization that had an entry of this kind sent */
  afterSent?(orgId: string): Promise<void> | void;
}

let snapshot: OutboxSnapshot = { loaded: false, entries: [], sent: new Map(), sending: false };
const listeners = new Set<() => void>();
const channel =
  typeof BroadcastChannel === 'undefined' ? null : new BroadcastChannel('hourstone-outbox');

function publish(next: Partial<OutboxSnapshot>) {
  snapshot = { ...snapshot, ...next };
  for (const listener of listeners) listener();
}

async function reload(): Promise<void> {
  try {
    publish({ entries: await readEntries(), loaded: true });
  } catch {
    publish({ loaded: true });
  }
}

/** After a change here: read the store again and tell the other tabs. */
async function changed(): Promise<void> {
  await reload();
  channel?.postMessage('changed');
}

if (channel) channel.onmessage = () => void reload();
const ready = migrateStoredWalkarounds().then(reload, reload);

export function subscribeOutbox(listener: () => void): () => void {
  listeners.add(listener);
  return () => void listeners.delete(listener);
}

export const outboxSnapshot = () => snapshot;

/** Waits for the stored queue to be read (tests, and senders starting with the app). */
export const outboxReady = () => ready;

/** Keeps one piece of work on the phone; throws when the phone cannot store it. */
export async function enqueue(
  entry: Omit<OutboxEntry, 'state' | 'error' | 'seq' | 'queuedAt'> & { queuedAt?: string },
): Promise<void> {
  await ready;
  const seq = Math.max(Date.now(), ...snapshot.entries.map((e) => e.seq + 1));
  await putEntry({
    queuedAt: new Date().toISOString(),
    ...entry,
    seq,
    state: 'waiting',
    error: null,
  });
  await changed();
}

export async function discard(id: string): Promise<void> {
  await deleteEntry(id);
  await changed();
}

/** A refused entry goes back in the queue as it was, to be sent on the next run. */
export async function sendAgain(id: string): Promise<void> {
  const entry = await getEntry(id);
  if (entry) await putEntry({ ...entry, state: 'waiting', error: null });
  await changed();
}

// Worth trying again later: no connection, a server not answering, the session to renew.
export const isTransient = (error: unknown) =>
  !isApiError(error) ||
  error.code === 'unreachable' ||
  error.status === 401 ||
  error.status === 429 ||
  error.status >= 500;

/** The server's reason for refusing an entry, with the fields it named. */
export function refusalText(error: unknown): string {
  if (!isApiError(error)) return 'Hourstone refused this.';
  const fields = Object.values(error.fields);
  return fields.length ? `${error.message} ${fields.join(' ')}` : error.message;
}

/** The same error with its field messages renamed (e.g. readings.2.value → "T-04: …"). */
export const withFields = (error: ApiError, fields: Record<string, string>) =>
  new ApiError({
    status: error.status,
    code: error.code,
    message: error.message,
    fields,
    retryAfter: error.retryAfter,
  });

let running: Promise<number> | null = null;

/**
 * Sends the signed-in person's waiting entries, oldest first; stops at the first one that fails
 * for want of a connection. One run at a time; answers how many went out.
 */
export function flushOutbox(
  userId: string,
  senders: Record<string, OutboxSender>,
): Promise<number> {
  if (running) return running;
  running = (async () => {
    await ready;
    const waiting = (await readEntries()).filter(
      (e) => e.userId === userId && e.state === 'waiting' && senders[e.kind],
    );
    if (waiting.length === 0) return 0;
    publish({ sending: true });
    const touched = new Map<string, Set<string>>();
    let sentCount = 0;
    for (const entry of waiting) {
      try {
        const outcome = await senders[entry.kind].send(entry, async (progress) => {
          await putEntry(progress);
        });
        snapshot = { ...snapshot, sent: new Map(snapshot.sent).set(entry.id, outcome) };
        await deleteEntry(entry.id);
        touched.set(entry.kind, (touched.get(entry.kind) ?? new Set()).add(entry.orgId));
        sentCount += 1;
      } catch (error) {
        if (isTransient(error)) break;
        const latest = (await getEntry(entry.id)) ?? entry;
        await putEntry({ ...latest, state: 'refused', error: refusalText(error) });
      }
    }
    await changed();
    for (const [kind, orgIds] of touched)
      for (const orgId of orgIds) await senders[kind].afterSent?.(orgId);
    return sentCount;
  })().finally(() => {
    running = null;
    publish({ sending: false });
  });
  return running;
}
