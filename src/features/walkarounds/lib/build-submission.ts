import type { UnitSystem } from '../../../../shared/constants';
import { meterInputError, parseMeterInput } from '../../../lib/meter-input';
import {
  walkaroundCreateSchema,
  type WalkaroundCreateInput,
  type WalkaroundPurpose,
} from '../../../../shared/schemas/walkarounds';
import type { ChecklistItem } from '../api/types';
import type { WalkaroundDraft } from './draft';

export interface SubmissionErrors {
  meterValue?: string;
  /** itemId → message */
  items: Record<string, string>;
  /** what belongs to no single field */
  form?: string;
}

export { parseMeterInput };

export const UNANSWERED = 'Choose OK, Attention or Fail';

/**
 * The POST body for a finished draft, checked with the schema the server uses, or the errors to
 * show beside the fields. Every item on the checklist must be answered.
 */
export function buildSubmission(
  draft: WalkaroundDraft,
  context: {
    machineId: string;
    purpose: WalkaroundPurpose;
    items: ChecklistItem[];
    units: UnitSystem;
    /** ISO instant: when the walkaround was done (the moment it is sent or saved) */
    performedAt: string;
    /** the daily-care tasks on the checklist now: a tick of one no longer there is dropped */
    careTaskIds?: readonly string[];
  },
): { ok: true; input: WalkaroundCreateInput } | { ok: false; errors: SubmissionErrors } {
  const errors: SubmissionErrors = { items: {} };
  for (const item of context.items) {
    if (!draft.answers[item.id]?.result) errors.items[item.id] = UNANSWERED;
  }
  const meterText = draft.meterValue.trim();
  const meterValue = parseMeterInput(meterText, context.units);
  if (!meterText) errors.meterValue = 'Enter the meter as it reads now';
  else errors.meterValue = meterInputError(meterText, context.units) ?? undefined;

  const parsed = walkaroundCreateSchema.safeParse({
    machineId: context.machineId,
    clientId: draft.clientId,
    purpose: context.purpose,
    meterValue,
    performedAt: context.performedAt,
    notes: draft.notes,
    careDone: (draft.careDone ?? []).filter((id) => context.careTaskIds?.includes(id) ?? true),
    items: context.items.map((item) => {
      const answer = draft.answers[item.id];
      return {
        itemId: item.id,
        result: answer?.result ?? 'ok',
        note: answer?.note ?? '',
        photoId: answer?.photo?.id ?? null,
      };
    }),
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const [first, index] = issue.path;
      if (first === 'meterValue') errors.meterValue ??= issue.message;
      else if (first === 'items' && typeof index === 'number' && context.items[index])
        errors.items[context.items[index].id] ??= issue.message;
      else errors.form ??= issue.message;
    }
  }
  const failed = errors.meterValue || errors.form || Object.keys(errors.items).length > 0;
  if (failed || !parsed.success) return { ok: false, errors };
  return { ok: true, input: parsed.data };
}
