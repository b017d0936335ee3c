import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { reminderSchema } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Skeleton } from '../../../components/ui/skeleton';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useReminderDraft } from '../api/get-reminder-draft';
import { useSendReminder, type ReminderResult } from '../api/send-reminder';
import type { ReminderDraft } from '../api/types';
import { FormDialog } from './form-dialog';

interface ReminderDialogProps {
  orgId: string;
  customer: { id: string; name: string };
  taskIds: string[];
  onClose: () => void;
}

/** "Send reminder": the server's template, editable, sent to the customer's managers. */
export function ReminderDialog({ orgId, customer, taskIds, onClose }: ReminderDialogProps) {
  const draft = useReminderDraft(orgId, customer.id, taskIds);
  return (
    <FormDialog open title={`Reminder to ${customer.name}`} onClose={onClose}>
      {draft.isPending ? (
        <div role="status" className="flex flex-col gap-3">
          <span className="sr-only">Preparing the reminder</span>
          <Skeleton className="h-10 w-full" />
          <Skeleton className="h-48 w-full" />
        </div>
      ) : draft.isError ? (
        <>
          <Alert>{draft.error.message}</Alert>
          <Button variant="secondary" onClick={onClose}>
            Close
          </Button>
        </>
      ) : (
        <ReminderForm
          orgId={orgId}
          customerId={customer.id}
          taskIds={taskIds}
          draft={draft.data}
          onClose={onClose}
        />
      )}
    </FormDialog>
  );
}

function ReminderForm({
  orgId,
  customerId,
  taskIds,
  draft,
  onClose,
}: {
  orgId: string;
  customerId: string;
  taskIds: string[];
  draft: ReminderDraft;
  onClose: () => void;
}) {
  const send = useSendReminder(orgId, customerId);
  // One id per opened dialog: a second click (or a retry) of this dialog sends nothing more.
  const [requestId] = useState(() => crypto.randomUUID());
  const [formError, setFormError] = useState<string | null>(null);
  const [result, setResult] = useState<ReminderResult | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(reminderSchema),
    defaultValues: { taskIds, subject: draft.subject, body: draft.body, requestId },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      setResult(await send.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['subject', 'body']));
    }
  });

  const to = draft.recipients.map((r) => r.name).join(', ');
  if (result) {
    return (
      <>
        <Alert tone="success">
          {result.duplicate
            ? 'This reminder was sent already; nothing more was sent.'
            : `Reminder sent to ${result.recipients} ${result.recipients === 1 ? 'manager' : 'managers'} of ${draft.customer.name}.`}
        </Alert>
        <Button onClick={onClose}>Done</Button>
      </>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      <p className="text-field-700">
        To the {draft.recipients.length === 1 ? 'manager' : 'managers'} of {draft.customer.name}
        {to ? `: ${to}` : ''}. Replies come to your e-mail.
      </p>
      <TextField label="Subject" error={errors.subject?.message} {...register('subject')} />
      <TextareaField label="Message" rows={12} error={errors.body?.message} {...register('body')} />
      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" icon="mail" pending={isSubmitting}>
          Send reminder
        </Button>
      </div>
    </form>
  );
}
