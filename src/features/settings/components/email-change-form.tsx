import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { emailChangeSchema } from '../../../../shared/schemas/account';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestEmailChange } from '../api/account';

/** A new address: it takes effect once the link sent to it is opened. */
export function EmailChangeForm({
  email,
  pendingEmail,
}: {
  email: string;
  pendingEmail: string | null;
}) {
  const request = useRequestEmailChange();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(emailChangeSchema),
    defaultValues: { email: '', currentPassword: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await request.mutateAsync(values);
      reset();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'currentPassword']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <p>
        You sign in with <strong className="break-all">{email}</strong>.
      </p>
      {pendingEmail ? (
        <Alert tone="info" title="Waiting for confirmation">
          We sent a link to {pendingEmail}. Your address changes when you open it; until then you
          keep signing in with {email}.
        </Alert>
      ) : null}
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="New e-mail address"
          type="email"
          inputMode="email"
          autoComplete="email"
          autoCapitalize="none"
          spellCheck={false}
          error={errors.email?.message}
          {...register('email')}
        />
        <TextField
          label="Your password"
          hint="To be sure it is you."
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...register('currentPassword')}
        />
      </div>
      <div>
        <Button type="submit" pending={isSubmitting}>
          Send confirmation link
        </Button>
      </div>
    </form>
  );
}
