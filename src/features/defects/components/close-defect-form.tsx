import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { defectCloseSchema } from '../../../../shared/schemas/defects';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { formatLocalDate } from '../../../lib/fleet-format';
import { useCloseDefect } from '../api/close-defect';
import { useCompletedRecords } from '../api/get-completed-records';
import type { ClosedDefect, CompletedRecord, Defect } from '../api/types';

const recordLabel = (record: CompletedRecord) =>
  [
    record.performedOn ? formatLocalDate(record.performedOn) : 'Undated',
    record.tasks.map((task) => task.name).join(', ') ||
      record.notes.slice(0, 60) ||
      'Service visit',
  ].join(' · ');

/**
 * Close a defect as fixed: say what was done, or pick the completed service record that did it.
 * Closing never releases a tagged-out machine; the form says so before and after.
 */
export function CloseDefectForm({
  orgId,
  defect,
  onDone,
  onClosed,
}: {
  orgId: string;
  defect: Defect;
  onDone: () => void;
  onClosed: (closed: ClosedDefect) => void;
}) {
  const close = useCloseDefect(orgId);
  const records = useCompletedRecords(orgId, defect.machine.id);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(defectCloseSchema),
    defaultValues: { note: '', serviceRecordId: undefined },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const closed = await close.mutateAsync({ defectId: defect.id, input: values });
      onClosed(closed);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['note', 'serviceRecordId']));
    }
  });

  const recordOptions = [
    { value: '', label: records.isPending ? 'Loading service records…' : 'None — the note says' },
    ...(records.data ?? []).map((record) => ({ value: record.id, label: recordLabel(record) })),
  ];

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={`Close ${defect.title}`}
      className="flex flex-col gap-3 rounded-lg border border-field-200 bg-field-50 p-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      {defect.machine.status === 'tagged_out' ? (
        <Alert tone="warning" title={`${defect.machine.fleetNumber} stays tagged out`}>
          Closing this defect does not release the machine. It stays tagged out until a technician
          or manager returns it to service, with a note of what was checked.
        </Alert>
      ) : null}
      <TextareaField
        label="What was done"
        hint="Enough for the next person to know it is fixed (a note, or the service record below)."
        error={errors.note?.message}
        {...register('note')}
      />
      <SelectField
        label="Fixed by a service record"
        hint={
          records.isError
            ? "The machine's service records didn't load; a note closes it as well."
            : records.data?.length === 0
              ? `No completed service records of ${defect.machine.fleetNumber} yet.`
              : undefined
        }
        options={recordOptions}
        error={errors.serviceRecordId?.message}
        {...register('serviceRecordId', { setValueAs: (value: string) => value || undefined })}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={isSubmitting} className="min-h-12">
          Close defect
        </Button>
        <Button variant="ghost" className="min-h-12" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
