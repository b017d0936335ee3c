import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { reminderSettingsSchema } from '../../../../shared/schemas/notifications';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateDigestHour } from '../api/update-digest-hour';
import { formatTimeZoneName } from '../../../lib/format';

/** "06:00": an hour of the farm's day. */
export const hourLabel = (hour: number) => `${String(hour).padStart(2, '0')}:00`;

const HOUR_OPTIONS = Array.from({ length: 24 }, (_, hour) => ({
  value: String(hour),
  label: hourLabel(hour),
}));

/** The farm's digest hour (a manager's setting): when due lists and log-hours reminders go out. */
export function DigestHourForm({
  orgId,
  digestHour,
  timeZone,
}: {
  orgId: string;
  digestHour: number;
  timeZone: string;
}) {
  const update = useUpdateDigestHour(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(reminderSettingsSchema),
    defaultValues: { digestHour },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      await update.mutateAsync(values);
      setSaved(true);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['digestHour']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {saved ? <Alert tone="success">Saved. Reminders go out from then on.</Alert> : null}
      <SelectField
        label="Digest hour"
        hint={`Local time of the farm (${formatTimeZoneName(timeZone)}). Due lists and log-hours reminders are sent from this hour on, once a day.`}
        options={HOUR_OPTIONS}
        error={errors.digestHour?.message}
        {...register('digestHour', { valueAsNumber: true })}
      />
      <div>
        <Button type="submit" icon="check" pending={isSubmitting} className="w-full sm:w-auto">
          Save digest hour
        </Button>
      </div>
    </form>
  );
}
