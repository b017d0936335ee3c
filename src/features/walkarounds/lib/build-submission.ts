import type { UnitSystem } from '../../../../shared/constants';
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

/**
 * A typed meter value as a number, NaN when it is not one. Imperial farms write 3,118.5 (comma
 * groups thousands); metric farms often type 3118,5 on a phone keypad (comma is the decimal).
 * (The same reading as the log-hours form's; a feature does not import another.)
 */
export function parseMeterInput(text: string, units: UnitSystem): number {
  let s = text.replace(/\s/g, '');
  if (units === 'imperial') s = s.replace(/,/g, '');
  else if (/^\d+,\d+$/.test(s)) s = s.replace(',', '.');
  return /^\d+(\.\d+)?$/.test(s) ? Number(s) : Number.NaN;
}

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
  },
): { ok: true; input: WalkaroundCreateInput } | { ok: false; errors: SubmissionErrors } {
  const errors: SubmissionErrors = { items: {} };
  for (const item of context.items) {
    if (!draft.answers[item.id]?.result) errors.items[item.id] = UNANSWERED;
  }
  const meterText = draft.meterValue.trim();
  const meterValue = parseMeterInput(meterText, context.units);
  if (!meterText) errors.meterValue = 'Enter the meter as it reads now';
  else if (Number.isNaN(meterValue)) errors.meterValue = 'Enter the meter as a number, like 1452.5';

  const parsed = walkaroundCreateSchema.safeParse({
    machineId: context.machineId,
    clientId: draft.clientId,
    purpose: context.purpose,
    meterValue,
    performedAt: context.performedAt,
    notes: draft.notes,
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
