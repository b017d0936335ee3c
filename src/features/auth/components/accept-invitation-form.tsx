import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { invitationAcceptSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import type { Me } from '../../../lib/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';
import type { InvitationPreview } from '../api/get-invitation';

interface AcceptInvitationFormProps {
  token: string;
  invitation: InvitationPreview;
  onAccepted: (me: Me) => void;
}

export function AcceptInvitationForm({ token, invitation, onAccepted }: AcceptInvitationFormProps) {
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(invitationAcceptSchema),
    defaultValues: { name: invitation.name, password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onAccepted(await accept.mutateAsync({ token, ...values }));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="rounded-lg bg-oat-100 px-3 py-2">
        <p className="text-sm text-field-600">You'll sign in with</p>
        <p className="font-bold break-all text-field-900">{invitation.email}</p>
      </div>
      <TextField
        label="Your name"
        autoComplete="name"
        hint="How the rest of the team sees you."
        error={errors.name?.message}
        {...register('name')}
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
        Set password and join
      </Button>
    </form>
  );
}
