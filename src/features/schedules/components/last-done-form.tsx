import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { lastDoneSchema } from '../../../../shared/schemas/schedule';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useCurrentMembership } from '../../../lib/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterUnitLabel, todayInZone } from '../../../lib/fleet-format';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import { useSetLastDone } from '../api/set-last-done';
import type { Task } from '../api/types';

/** When a task was last done (before the machine came into Hourstone, or a missed record). */
export function LastDoneForm({
  orgId,
  task,
  unit,
  timeZone,
  onDone,
}: {
  orgId: string;
  task: Task;
  unit: string;
  timeZone: string;
  onDone: () => void;
}) {
  const setLastDone = useSetLastDone(orgId, task.machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const today = todayInZone(timeZone);
  const { units } = useCurrentMembership().membership.organization;
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: withMeterReasons(zodResolver(lastDoneSchema)),
    defaultValues: {
      lastDoneMeter: task.lastDoneMeter ?? (undefined as unknown as number),
      lastDoneOn: task.lastDoneOn ?? today,
    },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await setLastDone.mutateAsync({ taskId: task.id, ...values });
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['lastDoneMeter', 'lastDoneOn']));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Set last done for ${task.name}`}
      className="flex flex-col gap-3 rounded-lg border border-field-200 bg-oat-50 p-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Meter when last done"
          hint={`Lifetime ${meterUnitLabel(unit)} (counting any replaced meter)`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          autoFocus
          error={errors.lastDoneMeter?.message}
          {...register('lastDoneMeter', meterValueAs(units))}
        />
        <TextField
          label="Date last done"
          type="date"
          max={today}
          error={errors.lastDoneOn?.message}
          {...register('lastDoneOn')}
        />
      </div>
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting}>
          Save last done
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
