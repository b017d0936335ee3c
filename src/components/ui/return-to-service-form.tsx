import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { returnToServiceSchema } from '../../../shared/schemas/defects';
import { applyServerErrors } from '../../lib/form-errors';
import { Alert } from './alert';
import { Button } from './button';
import { TextareaField } from './textarea-field';

/**
 * The one form of the "return to service" step, wherever it is offered (the machine page, the
 * defects page, a service record): the note of what was checked, and a caution. The caller's
 * mutation does the request, so each feature keeps its own API call.
 */
export function ReturnToServiceForm({
  fleetNumber,
  onSubmit,
  onCancel,
}: {
  fleetNumber: string;
  onSubmit: (note: string) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(returnToServiceSchema), defaultValues: { note: '' } });

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
      aria-label={`Return ${fleetNumber} to service`}
      className="flex flex-col gap-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <TextareaField
        label="What was checked before returning it to service"
        hint="Required, and kept with the machine's history. Check the repair and the machine as the operator's manual, local regulations and qualified service practice require before anyone uses it."
        error={errors.note?.message}
        {...register('note')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" icon="check" pending={isSubmitting} className="min-h-12">
          Return {fleetNumber} to service
        </Button>
        {onCancel ? (
          <Button variant="ghost" className="min-h-12" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
