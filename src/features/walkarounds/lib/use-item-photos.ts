import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiError } from '../../../lib/api-client';
import { deleteDraftPhoto, draftPhotos, saveDraftPhoto } from '../../../lib/outbox/outbox-db';
import { uploadWalkaroundPhoto } from '../api/upload-photo';
import type { PhotoState } from '../components/item-photo';
import type { DraftAnswer } from './draft';

type UploadedRef = NonNullable<DraftAnswer['photo']>;

const isOffline = (error: unknown) => isApiError(error) && error.code === 'unreachable';

/**
 * Photos of the walkaround's items: uploaded as soon as they are taken (so sending is quick).
 * Without a connection the file waits in IndexedDB under the draft's clientId, so a reload keeps
 * it; it is tried again on sending, or goes with the walkaround into the outbox.
 */
export function useItemPhotos(
  orgId: string,
  machineId: string,
  clientId: string,
  setPhoto: (itemId: string, photo: UploadedRef | null) => void,
) {
  const [states, setStates] = useState<Record<string, PhotoState>>({});
  const waitingFiles = useRef(new Map<string, File>());
  const previews = useRef(new Map<string, string>());

  const setState = useCallback((itemId: string, state: PhotoState | null) => {
    if (state?.status !== 'waiting') {
      const preview = previews.current.get(itemId);
      if (preview) URL.revokeObjectURL(preview);
      previews.current.delete(itemId);
    }
    setStates((all) => {
      const next = { ...all };
      if (state) next[itemId] = state;
      else delete next[itemId];
      return next;
    });
  }, []);

  const wait = useCallback(
    (itemId: string, file: File, store = true) => {
      waitingFiles.current.set(itemId, file);
      if (store) void saveDraftPhoto(`${clientId}/${itemId}`, file);
      const previewUrl = URL.createObjectURL(file);
      setState(itemId, null);
      previews.current.set(itemId, previewUrl);
      setStates((all) => ({ ...all, [itemId]: { status: 'waiting', previewUrl } }));
    },
    [setState, clientId],
  );

  // a reload in the middle of the walkaround: the photos that were waiting are still there
  useEffect(() => {
    let live = true;
    void draftPhotos(`${clientId}/`).then((stored) => {
      if (!live) return;
      for (const [itemId, file] of stored)
        if (!waitingFiles.current.has(itemId)) wait(itemId, file, false);
    });
    return () => {
      live = false;
    };
  }, [clientId, wait]);

  /** Uploads one photo; answers its reference, or null when it could not go. */
  const upload = useCallback(
    async (itemId: string, file: File): Promise<UploadedRef | null> => {
      setState(itemId, { status: 'uploading' });
      try {
        const photo = await uploadWalkaroundPhoto(orgId, machineId, file);
        const ref = { id: photo.id, thumbnailUrl: photo.thumbnailUrl };
        waitingFiles.current.delete(itemId);
        void deleteDraftPhoto(`${clientId}/${itemId}`);
        setPhoto(itemId, ref);
        setState(itemId, null);
        return ref;
      } catch (error) {
        if (isOffline(error)) wait(itemId, file);
        else {
          waitingFiles.current.delete(itemId);
          void deleteDraftPhoto(`${clientId}/${itemId}`);
          setState(itemId, {
            status: 'error',
            message: isApiError(error) ? error.message : 'The photo could not be uploaded.',
          });
        }
        return null;
      }
    },
    [orgId, machineId, clientId, setPhoto, setState, wait],
  );

  const pick = useCallback(
    (itemId: string, file: File) => {
      setPhoto(itemId, null);
      if (!navigator.onLine) wait(itemId, file);
      else void upload(itemId, file);
    },
    [setPhoto, upload, wait],
  );

  const remove = useCallback(
    (itemId: string) => {
      waitingFiles.current.delete(itemId);
      void deleteDraftPhoto(`${clientId}/${itemId}`);
      setPhoto(itemId, null);
      setState(itemId, null);
    },
    [clientId, setPhoto, setState],
  );

  /**
   * Before sending: tries the photos still waiting. Answers those uploaded now (the draft in
   * state has not caught up yet) and the files still waiting for a connection.
   */
  const uploadWaiting = useCallback(async () => {
    const uploaded: Record<string, UploadedRef> = {};
    const waiting = new Map<string, File>();
    for (const [itemId, file] of [...waitingFiles.current]) {
      const ref = navigator.onLine ? await upload(itemId, file) : null;
      if (ref) uploaded[itemId] = ref;
      else if (waitingFiles.current.has(itemId)) waiting.set(itemId, file);
    }
    return { uploaded, waiting };
  }, [upload]);

  /** The walkaround left the form (sent, or queued with its own copy of the files). */
  const clearStored = useCallback(async () => {
    for (const itemId of (await draftPhotos(`${clientId}/`)).keys())
      await deleteDraftPhoto(`${clientId}/${itemId}`);
  }, [clientId]);

  useEffect(() => {
    const urls = previews.current;
    return () => urls.forEach((url) => URL.revokeObjectURL(url));
  }, []);

  const busy = Object.values(states).some((state) => state.status === 'uploading');
  return { states, pick, remove, uploadWaiting, clearStored, busy };
}
