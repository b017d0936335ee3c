import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { signInSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import type { Me } from '../../../lib/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

interface SignInFormProps {
  onSignedIn: (me: Me) => void;
  forgotPasswordHref: string;
}

export function SignInForm({ onSignedIn, forgotPasswordHref }: SignInFormProps) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedIn(await signIn.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'password']));
    }
  });

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
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Sign in
      </Button>
      <Link
        to={forgotPasswordHref}
        className="inline-flex min-h-touch items-center justify-center rounded-lg font-bold text-loam-700 underline underline-offset-4 hover:text-loam-900"
      >
        Forgot your password?
      </Link>
    </form>
  );
}
