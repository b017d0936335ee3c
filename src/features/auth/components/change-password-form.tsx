import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordChangeSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useChangePassword } from '../api/change-password';

/** Change the password with the current one; every other device is signed out. */
export function ChangePasswordForm() {
  const changePassword = useChangePassword();
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(false);
    try {
      await changePassword.mutateAsync(values);
      reset();
      setDone(true);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['currentPassword', 'password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {done ? (
        <Alert tone="success" title="Password changed">
          <p>You are still signed in here; every other phone or computer has been signed out.</p>
        </Alert>
      ) : null}
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. Other devices signed in as you are signed out."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={isSubmitting} className="w-full sm:w-auto">
        Change password
      </Button>
    </form>
  );
}
