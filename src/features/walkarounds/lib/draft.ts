import type { WalkaroundPurpose, WalkaroundResult } from '../../../../shared/schemas/walkarounds';
import type { Checklist } from '../api/types';
import { newClientId, readJson, removeKey, writeJson } from './storage';

// A walkaround in progress, kept on the phone as the operator goes, so a reload or a lost
// connection in the yard loses nothing. One draft per machine and purpose.

export interface DraftAnswer {
  result: WalkaroundResult | null;
  note: string;
  /** the uploaded photo (uploaded as soon as it is taken) */
  photo: { id: string; thumbnailUrl: string } | null;
}

export interface WalkaroundDraft {
  version: 1;
  /** generated once when the walkaround starts; the server never records it twice */
  clientId: string;
  startedAt: string;
  /** as typed, so a half-typed value survives */
  meterValue: string;
  answers: Record<string, DraftAnswer>;
  notes: string;
  /** ids of the daily-care tasks ticked done (drafts stored before daily care have none) */
  careDone?: string[];
  /** the checklist it was started on, to carry on without a connection */
  checklist: Checklist | null;
}

const keyOf = (orgId: string, machineId: string, purpose: WalkaroundPurpose) =>
  `hourstone.walkaround.draft.${orgId}.${machineId}.${purpose}`;

export const emptyAnswer = (): DraftAnswer => ({ result: null, note: '', photo: null });

export function newDraft(checklist: Checklist | null): WalkaroundDraft {
  return {
    version: 1,
    clientId: newClientId(),
    startedAt: new Date().toISOString(),
    meterValue: '',
    answers: {},
    notes: '',
    checklist,
  };
}

export function loadDraft(
  orgId: string,
  machineId: string,
  purpose: WalkaroundPurpose,
): WalkaroundDraft | null {
  const draft = readJson<WalkaroundDraft>(keyOf(orgId, machineId, purpose));
  return draft?.version === 1 && typeof draft.clientId === 'string' ? draft : null;
}

export function saveDraft(
  orgId: string,
  machineId: string,
  purpose: WalkaroundPurpose,
  draft: WalkaroundDraft,
): boolean {
  return writeJson(keyOf(orgId, machineId, purpose), draft);
}

export function clearDraft(orgId: string, machineId: string, purpose: WalkaroundPurpose): void {
  removeKey(keyOf(orgId, machineId, purpose));
}
