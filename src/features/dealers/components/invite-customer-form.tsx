import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { customerInvitationSchema } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useInviteCustomer } from '../api/invite-customer';

/** Ask a farm for access: its manager gets a single-use link and chooses view or service. */
export function InviteCustomerForm({ orgId }: { orgId: string }) {
  const invite = useInviteCustomer(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(customerInvitationSchema),
    defaultValues: { email: '', message: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSentTo(null);
    try {
      const link = await invite.mutateAsync(values);
      setSentTo(link.invitedEmail);
      reset({ email: '', message: '' });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'message']));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {sentTo ? (
        <Alert tone="success">
          Request sent to {sentTo}. The farm&apos;s machines show on your board once the manager
          accepts.
        </Alert>
      ) : null}
      <TextField
        label="Farm manager's e-mail"
        type="email"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <TextareaField
        label="Message"
        hint="Optional: a line about why you ask."
        error={errors.message?.message}
        {...register('message')}
      />
      <div>
        <Button type="submit" icon="mail" pending={isSubmitting}>
          Send request
        </Button>
      </div>
    </form>
  );
}
