import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { dealerInvitationSchema } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useGrantDealer } from '../api/grant-dealer';
import { AccessChoice } from './access-choice';

/** The farm manager gives a dealer access by one of its service advisors' e-mail. */
export function GrantDealerForm({ orgId }: { orgId: string }) {
  const grant = useGrantDealer(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [granted, setGranted] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(dealerInvitationSchema),
    defaultValues: { email: '', access: 'view' as const },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setGranted(null);
    try {
      const link = await grant.mutateAsync(values);
      setGranted(link.dealer.name);
      reset({ email: '', access: 'view' });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'access']));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {granted ? (
        <Alert tone="success">{granted} has access now; their advisor is told by e-mail.</Alert>
      ) : null}
      <TextField
        label="Service advisor's e-mail"
        type="email"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        hint="Someone at the dealership who uses Hourstone."
        error={errors.email?.message}
        {...register('email')}
      />
      <Controller
        control={control}
        name="access"
        render={({ field }) => <AccessChoice value={field.value} onChange={field.onChange} />}
      />
      <div>
        <Button type="submit" icon="plus" pending={isSubmitting}>
          Give access
        </Button>
      </div>
    </form>
  );
}
