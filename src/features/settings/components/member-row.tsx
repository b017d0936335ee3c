import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { membershipUpdateSchema } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { SelectField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { roleLabel } from '../../../lib/format';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRemoveMembership } from '../api/remove-membership';
import type { Member } from '../api/types';
import { useUpdateMembership } from '../api/update-membership';
import { InitialsAvatar } from './initials-avatar';

interface MemberRowProps {
  orgId: string;
  organizationName: string;
  member: Member;
  isSelf: boolean;
  roleOptions: { value: string; label: string }[];
}

export function MemberRow({
  orgId,
  organizationName,
  member,
  isSelf,
  roleOptions,
}: MemberRowProps) {
  const [editing, setEditing] = useState(false);
  const [confirmingRemoval, setConfirmingRemoval] = useState(false);
  const remove = useRemoveMembership(orgId);
  const { name, email } = member.user;

  return (
    <li className="flex flex-col gap-3 p-4 sm:flex-row sm:items-center">
      <div className="flex min-w-0 flex-1 items-center gap-3">
        <InitialsAvatar name={name} />
        <div className="min-w-0">
          <p className="font-bold text-field-950">
            {name}
            {isSelf ? <span className="ml-2 text-sm font-normal text-field-600">(you)</span> : null}
          </p>
          <p className="truncate text-sm text-field-600">{email}</p>
        </div>
      </div>

      {editing ? (
        <RoleEditor
          orgId={orgId}
          member={member}
          roleOptions={roleOptions}
          onDone={() => setEditing(false)}
        />
      ) : (
        <div className="flex flex-wrap items-center gap-2 sm:justify-end">
          <Badge tone={member.role === 'manager' ? 'accent' : 'neutral'}>
            {roleLabel(member.role)}
          </Badge>
          {member.abilities.update ? (
            // the visible word starts the accessible name (WCAG 2.5.3); the name says whose
            <Button
              variant="secondary"
              aria-label={`Change access for ${name}`}
              onClick={() => setEditing(true)}
            >
              Change
            </Button>
          ) : null}
          {member.abilities.remove ? (
            <Button
              variant="ghost"
              icon="trash"
              aria-label={`Remove ${name}`}
              onClick={() => setConfirmingRemoval(true)}
            >
              Remove
            </Button>
          ) : null}
        </div>
      )}

      <ConfirmDialog
        open={confirmingRemoval}
        title={`Remove ${name}?`}
        confirmLabel="Remove from team"
        pending={remove.isPending}
        error={remove.error ? removalError(remove.error) : null}
        onCancel={() => {
          setConfirmingRemoval(false);
          remove.reset();
        }}
        onConfirm={() => remove.mutate(member.id, { onSuccess: () => setConfirmingRemoval(false) })}
      >
        {name} loses access to {organizationName} at once. Their past readings and records stay.
      </ConfirmDialog>
    </li>
  );
}

const removalError = (error: unknown) =>
  isApiError(error) ? error.message : 'Could not remove this person. Try again.';

function RoleEditor({
  orgId,
  member,
  roleOptions,
  onDone,
}: {
  orgId: string;
  member: Member;
  roleOptions: { value: string; label: string }[];
  onDone: () => void;
}) {
  const update = useUpdateMembership(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, isDirty },
  } = useForm({
    resolver: zodResolver(membershipUpdateSchema),
    defaultValues: { role: member.role },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await update.mutateAsync({ memberId: member.id, ...values });
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['role']));
    }
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={`Change access for ${member.user.name}`}
      className="flex flex-col gap-2 sm:w-80"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <SelectField
        label="New role"
        options={roleOptions}
        error={errors.role?.message}
        autoFocus
        {...register('role')}
      />
      <div className="flex gap-2">
        <Button type="submit" pending={isSubmitting} disabled={!isDirty} className="flex-1">
          Save
        </Button>
        <Button variant="secondary" onClick={onDone} className="flex-1">
          Cancel
        </Button>
      </div>
    </form>
  );
}
