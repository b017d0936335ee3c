import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { personName } from '../../../../shared/schemas/common';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateAccount } from '../api/account';

// The account update schema's one field, required here (the form always sends it).
const nameSchema = z.object({ name: personName });

/** The name the team sees. */
export function AccountNameForm({ name }: { name: string }) {
  const update = useUpdateAccount();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(nameSchema), defaultValues: { name } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      const account = await update.mutateAsync(values);
      reset({ name: account.name });
      setSaved(true);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {saved ? <Alert tone="success">Name saved.</Alert> : null}
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="Name"
        autoComplete="name"
        error={errors.name?.message}
        {...register('name')}
      />
      <div>
        <Button type="submit" pending={isSubmitting}>
          Save name
        </Button>
      </div>
    </form>
  );
}
