import type { QueryClient } from '@tanstack/react-query';
import type { WalkaroundCreateInput } from '../../../../shared/schemas/walkarounds';
import { changedBy, invalidate } from '../../../lib/invalidation';
import { enqueue, type OutboxEntry, type OutboxSender } from '../../../lib/outbox/outbox';
import { queryKeys } from '../../../lib/query-keys';
import { submitWalkaround } from '../api/submit-walkaround';
import { uploadWalkaroundPhoto } from '../api/upload-photo';
import type { WalkaroundOutcome } from '../api/types';

// A walkaround finished without a connection waits in the phone's outbox with the photos that
// could not be uploaded yet (the files themselves). Sending uploads each photo first and keeps
// its reference in the entry at once, so a photo is never uploaded twice, then posts the
// walkaround with its clientId: a resend the server already has answers duplicate: true.

export const WALKAROUND_KIND = 'walkaround';

export interface QueuedWalkaround {
  entry: OutboxEntry;
  input: WalkaroundCreateInput;
}

/** The walkarounds among the queue's entries, with their request bodies typed. */
export const queuedWalkarounds = (entries: readonly OutboxEntry[]): QueuedWalkaround[] =>
  entries
    .filter((entry) => entry.kind === WALKAROUND_KIND)
    .map((entry) => ({ entry, input: entry.body as WalkaroundCreateInput }));

export function enqueueWalkaround(item: {
  orgId: string;
  userId: string;
  fleetNumber: string;
  input: WalkaroundCreateInput;
  /** photos still on the phone, by checklist item id */
  photos: ReadonlyMap<string, File>;
}): Promise<void> {
  return enqueue({
    id: item.input.clientId,
    kind: WALKAROUND_KIND,
    orgId: item.orgId,
    userId: item.userId,
    label: `${item.fleetNumber} walkaround`,
    body: item.input,
    photos: [...item.photos].map(([key, file]) => ({
      key,
      name: file.name,
      blob: file,
      uploaded: null,
    })),
  });
}

/** The body with each uploaded photo's id on its checklist item. */
function withPhotoIds(input: WalkaroundCreateInput, entry: OutboxEntry): WalkaroundCreateInput {
  const ids = new Map(entry.photos.map((p) => [p.key, p.uploaded?.id ?? null]));
  return {
    ...input,
    items: input.items.map((item) =>
      ids.get(item.itemId) ? { ...item, photoId: ids.get(item.itemId) ?? null } : item,
    ),
  };
}

export const walkaroundSender = (queryClient: QueryClient): OutboxSender => ({
  async send(entry, saveProgress): Promise<WalkaroundOutcome> {
    const input = entry.body as WalkaroundCreateInput;
    let current = entry;
    for (const photo of entry.photos) {
      if (photo.uploaded || !photo.blob) continue;
      const file = new File([photo.blob], photo.name, { type: photo.blob.type });
      const uploaded = await uploadWalkaroundPhoto(entry.orgId, input.machineId, file);
      const ref = { id: uploaded.id, thumbnailUrl: uploaded.thumbnailUrl };
      current = {
        ...current,
        photos: current.photos.map((p) =>
          p.key === photo.key ? { ...p, blob: null, uploaded: ref } : p,
        ),
      };
      await saveProgress(current);
    }
    return submitWalkaround(entry.orgId, withPhotoIds(input, current));
  },
  async afterSent(orgId) {
    // the machine may be tagged out now: its checklist is fetched again on the next visit
    queryClient.removeQueries({ queryKey: queryKeys.walkarounds.checklists(orgId) });
    await invalidate(queryClient, changedBy.walkaround(orgId));
  },
});
