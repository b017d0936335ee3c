import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { Role } from '../../../../shared/constants';
import { invitationCreateSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

interface InviteFormProps {
  orgId: string;
  roleOptions: { value: Role; label: string }[];
}

export function InviteForm({ orgId, roleOptions }: InviteFormProps) {
  const create = useCreateInvitation(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const defaultRole = roleOptions.some((option) => option.value === 'operator')
    ? 'operator'
    : roleOptions[0].value;
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { email: '', name: '', role: defaultRole },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSentTo(null);
    try {
      const invitation = await create.mutateAsync(values);
      setSentTo(invitation.email);
      reset({ email: '', name: '', role: values.role });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'name', 'role']));
    }
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate

      className="flex flex-col gap-4"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      {sentTo ? (
        <Alert tone="success">Invitation sent to {sentTo}. It waits below until they accept.</Alert>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Email"
          type="email"
          inputMode="email"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          error={errors.email?.message}
          {...register('email')}
        />
        <TextField
          label="Name"
          autoComplete="off"
          error={errors.name?.message}
          {...register('name')}
        />
      </div>
      <SelectField
        label="Role"
        options={roleOptions}
        hint={
          roleOptions.length > 1
            ? 'Managers run the team and the fleet; technicians record services; operators log hours and walkarounds.'
            : undefined
        }
        error={errors.role?.message}
        {...register('role')}
      />
      <div>
        <Button type="submit" icon="plus" pending={isSubmitting} className="w-full sm:w-auto">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
