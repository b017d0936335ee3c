import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { passwordResetConfirmSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import type { Me } from '../../../lib/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

interface ResetPasswordFormProps {
  token: string;
  onReset: (me: Me) => void;
  forgotPasswordHref: string;
}

export function ResetPasswordForm({ token, onReset, forgotPasswordHref }: ResetPasswordFormProps) {
  const confirmReset = useConfirmPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(passwordResetConfirmSchema),
    // the token travels in the link, not in a field the person types
    defaultValues: { token, password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onReset(await confirmReset.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password', 'token']));
    }
  });

  // A token error (expired, used, mangled) has no field to sit beside: it is about the link.
  const tokenMessage = errors.token?.message;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {tokenMessage ? (
        <Alert title="This link no longer works">
          <p>{tokenMessage}</p>
          <Link
            to={forgotPasswordHref}
            className="mt-1 inline-flex min-h-touch items-center font-bold underline underline-offset-4"
          >
            Send me a new link
          </Link>
        </Alert>
      ) : null}
      {formError ? <Alert>{formError}</Alert> : null}
      <input type="hidden" {...register('token')} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A few unrelated words are easy to remember and hard to guess."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
