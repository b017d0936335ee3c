import { openDB, type DBSchema, type IDBPDatabase } from 'idb';

// What waits on this phone to be sent, in IndexedDB (through idb): unlike localStorage it holds
// the photos themselves as Blobs, and it survives a reload or a restart of the phone.

/** A photo taken offline: the file itself until it is uploaded, then the server's reference. */
export interface QueuedPhoto {
  /** which part of the body it belongs to (a walkaround's checklist item id) */
  key: string;
  name: string;
  blob: Blob | null;
  uploaded: { id: string; thumbnailUrl: string } | null;
}

export interface OutboxEntry {
  /** made on the phone when the work was done; the server never records it twice */
  id: string;
  /** which sender takes it: each kind's request, as its feature builds it */
  kind: string;
  orgId: string;
  /** who did it: only their own session sends it */
  userId: string;
  /** a few words for the list ("T-04 walkaround", "3 readings") */
  label: string;
  /** the request body as it will be sent (plain data, kept as it was given) */
  body: unknown;
  photos: QueuedPhoto[];
  /** for readings: the fleet numbers in the order of the body's rows, to name them in a reason */
  fleetNumbers?: string[];
  queuedAt: string;
  /** the order it was saved in: entries go out oldest first */
  seq: number;
  /** waiting: goes out with the connection; refused: the server said no, `error` says why */
  state: 'waiting' | 'refused';
  error: string | null;
}

interface OutboxSchema extends DBSchema {
  entries: { key: string; value: OutboxEntry; indexes: { seq: number } };
  /** photos of a walkaround still being filled in, by draft and item ("<clientId>/<itemId>") */
  draftPhotos: { key: string; value: { key: string; name: string; blob: Blob; savedAt: string } };
}

/** The database's name (the browser tests read it). */
export const OUTBOX_DB = 'hourstone-outbox';

let opened: Promise<IDBPDatabase<OutboxSchema>> | null = null;

/** The outbox database; null where the browser has no IndexedDB (or blocks it). */
export function outboxDb(): Promise<IDBPDatabase<OutboxSchema>> | null {
  if (typeof indexedDB === 'undefined') return null;
  opened ??= openDB<OutboxSchema>(OUTBOX_DB, 1, {
    upgrade(db) {
      const entries = db.createObjectStore('entries', { keyPath: 'id' });
      entries.createIndex('seq', 'seq');
      db.createObjectStore('draftPhotos', { keyPath: 'key' });
    },
  });
  return opened;
}

/** Every stored entry, oldest first. */
export async function readEntries(): Promise<OutboxEntry[]> {
  const db = await outboxDb();
  return db ? db.getAllFromIndex('entries', 'seq') : [];
}

export async function putEntry(entry: OutboxEntry): Promise<void> {
  const db = await outboxDb();
  if (!db) throw new Error('This browser cannot store anything offline.');
  await db.put('entries', entry);
}

export async function deleteEntry(id: string): Promise<void> {
  await (await outboxDb())?.delete('entries', id);
}

export async function getEntry(id: string): Promise<OutboxEntry | undefined> {
  return (await outboxDb())?.get('entries', id);
}

// --- photos of a walkaround in progress ----------------------------------------------------

export async function saveDraftPhoto(key: string, file: File): Promise<boolean> {
  try {
    const db = await outboxDb();
    if (!db) return false;
    await db.put('draftPhotos', {
      key,
      name: file.name,
      blob: file,
      savedAt: new Date().toISOString(),
    });
    return true;
  } catch {
    return false;
  }
}

/** The photos stored under `prefix` ("<clientId>/"), by the rest of their key. */
export async function draftPhotos(prefix: string): Promise<Map<string, File>> {
  const db = await outboxDb();
  const found = new Map<string, File>();
  if (!db) return found;
  const range = IDBKeyRange.bound(prefix, `${prefix}\uffff`);
  for (const photo of await db.getAll('draftPhotos', range))
    found.set(
      photo.key.slice(prefix.length),
      new File([photo.blob], photo.name, { type: photo.blob.type }),
    );
  return found;
}

export async function deleteDraftPhoto(key: string): Promise<void> {
  await (await outboxDb())?.delete('draftPhotos', key);
}
