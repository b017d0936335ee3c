import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  RESTRICTION_REASON_BOUNDS,
  restrictionLiftSchema,
  restrictionSetSchema,
} from '../../../../shared/schemas/machine-restrictions';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';

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
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(restrictionSetSchema),
    defaultValues: { reason: current ?? '' },
  });
  const submit = handleSubmit(async ({ reason }) => {
    setFormError(null);
    try {
      await onSubmit(reason);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['reason']));
    }
  });
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Restrict the use of ${fleetNumber}`}
      className="flex flex-col gap-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="What it may and may not be used for, and why"
        hint={`Operators read this before they start, e.g. "Field only — no road: left flasher out". ${RESTRICTION_REASON_BOUNDS.min}–${RESTRICTION_REASON_BOUNDS.max} characters. For a fault that makes it unsafe to use at all, tag it out instead.`}
        maxLength={RESTRICTION_REASON_BOUNDS.max}
        error={errors.reason?.message}
        {...register('reason')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" icon="check" pending={isSubmitting} className="min-h-12">
          {current ? 'Change the reason' : `Restrict ${fleetNumber}`}
        </Button>
        <Button variant="ghost" className="min-h-12" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
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
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(restrictionLiftSchema), defaultValues: { note: '' } });
  const submit = handleSubmit(async ({ note }) => {
    setFormError(null);
    try {
      await onSubmit(note);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['note']));
    }
  });
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Lift the restriction of ${fleetNumber}`}
      className="flex flex-col gap-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="What was done (optional)"
        hint="Check it as the operator's manual and local rules require before it is used without the limit."
        maxLength={RESTRICTION_REASON_BOUNDS.max}
        error={errors.note?.message}
        {...register('note')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" icon="check" pending={isSubmitting} className="min-h-12">
          Lift the restriction
        </Button>
        <Button variant="ghost" className="min-h-12" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
