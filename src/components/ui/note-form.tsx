import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyServerErrors } from '../../lib/form-errors';
import { Alert } from './alert';
import { Button } from './button';
import { TextField } from './field';
import { TextareaField } from './textarea-field';

type NoteValues = Record<string, string>;

/**
 * The form of a step that takes one line of words and a confirm (return to service, restrict a
 * machine, lift a restriction): the shared schema checks the one field, the server's refusal
 * lands on it, and the caller's mutation does the request.
 */
export function NoteForm({
  schema,
  field,
  initial = '',
  label,
  hint,
  multiline = false,
  maxLength,
  formLabel,
  submitLabel,
  onSubmit,
  onCancel,
}: {
  /** a shared schema of one text field (its other fields, if any, keep their defaults) */
  schema: z.ZodType;
  /** the schema's text field, as the server names it in a refusal */
  field: string;
  initial?: string;
  label: string;
  hint: string;
  multiline?: boolean;
  maxLength?: number;
  /** accessible name of the form */
  formLabel: string;
  submitLabel: string;
  onSubmit: (text: string) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NoteValues>({
    // the schema's own input and output are one string field: the form's values as it sees them
    resolver: zodResolver(schema as z.ZodType<NoteValues, NoteValues>) as Resolver<NoteValues>,
    defaultValues: { [field]: initial },
  });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(String(values[field] ?? ''));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, [field]));
    }
  });
  const Field = multiline ? TextareaField : TextField;
  const message = errors[field]?.message;
  return (
    <form onSubmit={submit} noValidate aria-label={formLabel} className="flex flex-col gap-3">
      {formError ? <Alert>{formError}</Alert> : null}
      <Field
        label={label}
        hint={hint}
        maxLength={maxLength}
        error={typeof message === 'string' ? message : undefined}
        {...register(field)}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" icon="check" pending={isSubmitting} className="min-h-12">
          {submitLabel}
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
