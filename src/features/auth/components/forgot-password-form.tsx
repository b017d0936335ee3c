import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetRequestSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

interface ForgotPasswordFormProps {
  /** shown under the confirmation, e.g. a link to the development mail box */
  afterSent?: ReactNode;
}

export function ForgotPasswordForm({ afterSent }: ForgotPasswordFormProps) {
  const requestReset = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await requestReset.mutateAsync(values);
      setSentTo(values.email);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email']));
    }
  });

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Check your e-mail">
          If <strong className="break-all">{sentTo}</strong> has a Hourstone account, a link to set
          a new password is on its way. The link works once and expires after a while.
        </Alert>
        {afterSent}
        <Button variant="secondary" onClick={() => setSentTo(null)}>
          Use a different address
        </Button>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="Email"
        type="email"
        inputMode="email"
        autoComplete="username"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
