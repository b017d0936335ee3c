import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signUpSchema } from '../../../../shared/schemas/account';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSignUp } from '../api/sign-up';

interface SignUpFormProps {
  /** shown under the confirmation, e.g. a link to the development mail box */
  afterSent?: ReactNode;
}

/** Name, e-mail and password; the account is made when the e-mailed link is opened. */
export function SignUpForm({ afterSent }: SignUpFormProps) {
  const signUp = useSignUp();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signUp.mutateAsync(values);
      setSentTo(values.email);
      reset();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'email', 'password']));
    }
  });

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Check your e-mail">
          We sent a link to <strong className="break-all">{sentTo}</strong>. Open it to confirm the
          address and finish creating your account; it works once, within a day. Nothing is made
          until you do.
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
        label="Your name"
        autoComplete="name"
        error={errors.name?.message}
        {...register('name')}
      />
      <TextField
        label="Email"
        type="email"
        inputMode="email"
        autoComplete="email"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Create account
      </Button>
    </form>
  );
}
