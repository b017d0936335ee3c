// The phone's outbox as the browser tests read it: the IndexedDB store of src/lib/outbox.
import type { Page } from 'playwright-core';

export interface StoredEntry {
  id: string;
  kind: string;
  label: string;
  state: 'waiting' | 'refused';
  error: string | null;
  body: Record<string, unknown>;
  photos: { key: string; blob: Blob | null; uploaded: { id: string } | null }[];
}

/** Every entry waiting (or refused) in the page's outbox, oldest first; blobs as their sizes. */
export function queuedEntries(page: Page) {
  return page.evaluate(
    () =>
      new Promise<
        (Omit<StoredEntry, 'photos'> & { photos: { key: string; size: number | null }[] })[]
      >((resolve, reject) => {
        const open = indexedDB.open('hourstone-outbox');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('entries')) return resolve([]);
          const all = db.transaction('entries').objectStore('entries').index('seq').getAll();
          all.onsuccess = () =>
            resolve(
              (all.result as StoredEntry[]).map((e) => ({
                ...e,
                photos: e.photos.map((p) => ({ key: p.key, size: p.blob ? p.blob.size : null })),
              })),
            );
          all.onerror = () => reject(all.error);
        };
      }),
  );
}
