import { useCallback, useEffect, useRef, useState } from 'react';
import type { WalkaroundPurpose } from '../../../../shared/schemas/walkarounds';
import {
  clearDraft,
  emptyAnswer,
  loadDraft,
  newDraft,
  saveDraft,
  type DraftAnswer,
  type WalkaroundDraft,
} from './draft';

/** A draft older than this is yesterday's check, not the one being done now: start afresh. */
const DRAFT_MAX_AGE_MS = 12 * 60 * 60 * 1000;

function freshOrStored(orgId: string, machineId: string, purpose: WalkaroundPurpose) {
  const stored = loadDraft(orgId, machineId, purpose);
  if (stored && Date.now() - new Date(stored.startedAt).getTime() < DRAFT_MAX_AGE_MS) {
    return {
      draft: stored,
      resumed: Object.keys(stored.answers).length > 0 || !!stored.meterValue,
    };
  }
  return { draft: newDraft(stored?.checklist ?? null), resumed: false };
}

/**
 * The walkaround being filled in, written to the phone's storage on every change. `finish`
 * removes it once the walkaround is sent or queued (and stops writing it back).
 */
export function useWalkaroundDraft(orgId: string, machineId: string, purpose: WalkaroundPurpose) {
  const [initial] = useState(() => freshOrStored(orgId, machineId, purpose));
  const [draft, setDraft] = useState<WalkaroundDraft>(initial.draft);
  const [stored, setStored] = useState(true);
  const finished = useRef(false);

  useEffect(() => {
    if (finished.current) return;
    setStored(saveDraft(orgId, machineId, purpose, draft));
  }, [orgId, machineId, purpose, draft]);

  const update = useCallback((change: (draft: WalkaroundDraft) => WalkaroundDraft) => {
    finished.current = false;
    setDraft(change);
  }, []);

  const updateAnswer = useCallback(
    (itemId: string, change: Partial<DraftAnswer>) =>
      update((d) => ({
        ...d,
        answers: { ...d.answers, [itemId]: { ...(d.answers[itemId] ?? emptyAnswer()), ...change } },
      })),
    [update],
  );

  const finish = useCallback(() => {
    finished.current = true;
    clearDraft(orgId, machineId, purpose);
  }, [orgId, machineId, purpose]);

  /** Throw the answers away and start a new walkaround (a new clientId). */
  const startOver = useCallback(() => {
    finished.current = false;
    setDraft((d) => newDraft(d.checklist));
  }, []);

  return { draft, resumed: initial.resumed, stored, update, updateAnswer, finish, startOver };
}
