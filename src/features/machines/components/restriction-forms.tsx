import {
  RESTRICTION_REASON_BOUNDS,
  restrictionLiftSchema,
  restrictionSetSchema,
} from '../../../../shared/schemas/machine-restrictions';
import { NoteForm } from '../../../components/ui/note-form';

/** Restrict a machine, or change the reason: what it may and may not be used for, and why. */
export function RestrictForm({
  fleetNumber,
  current,
  onSubmit,
  onCancel,
}: {
  fleetNumber: string;
  /** the reason it has now, when changing it */
  current: string | null;
  onSubmit: (reason: string) => Promise<unknown>;
  onCancel: () => void;
}) {
  return (
    <NoteForm
      schema={restrictionSetSchema}
      field="reason"
      initial={current ?? ''}
      label="What it may and may not be used for, and why"
      hint={`Operators read this before they start, e.g. "Field only — no road: left flasher out". ${RESTRICTION_REASON_BOUNDS.min}–${RESTRICTION_REASON_BOUNDS.max} characters. For a fault that makes it unsafe to use at all, tag it out instead.`}
      maxLength={RESTRICTION_REASON_BOUNDS.max}
      formLabel={`Restrict the use of ${fleetNumber}`}
      submitLabel={current ? 'Change the reason' : `Restrict ${fleetNumber}`}
      onSubmit={onSubmit}
      onCancel={onCancel}
    />
  );
}

/** Lift a restriction, with an optional note of what was done (kept in the farm's log). */
export function LiftRestrictionForm({
  fleetNumber,
  onSubmit,
  onCancel,
}: {
  fleetNumber: string;
  onSubmit: (note: string) => Promise<unknown>;
  onCancel: () => void;
}) {
  return (
    <NoteForm
      schema={restrictionLiftSchema}
      field="note"
      label="What was done (optional)"
      hint="Check it as the operator's manual and local rules require before it is used without the limit."
      maxLength={RESTRICTION_REASON_BOUNDS.max}
      formLabel={`Lift the restriction of ${fleetNumber}`}
      submitLabel="Lift the restriction"
      onSubmit={onSubmit}
      onCancel={onCancel}
    />
  );
}
