import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { formatDateTime, formatTimeZoneName } from '../../../lib/format';
import {
  formatMeter,
  fromDateTimeLocalValue,
  toDateTimeLocalValue,
} from '../../../lib/fleet-format';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import { useLogReading } from '../api/log-reading';
import type { Reading } from '../api/types';
import { readingFormSchema } from '../lib/reading-form-schema';

interface ReadingFormProps {
  orgId: string;
  machineId: string;
  unit: string;
  /** the farm's units: how a typed comma is read */
  units: UnitSystem;
  timeZone: string;
  /** the newest reading, as the meter showed it, for the hint */
  latest: Reading | null;
}

/** "Log a reading": the meter as it shows now, optionally when it was read. */
export function ReadingForm({ orgId, machineId, unit, units, timeZone, latest }: ReadingFormProps) {
  const log = useLogReading(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ tone: 'success' | 'info'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: withMeterReasons(zodResolver(readingFormSchema)),
    defaultValues: { value: undefined as unknown as number, takenAt: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    setNotice(null);
    let takenAt: string | undefined;
    if (values.takenAt) {
      const instant = fromDateTimeLocalValue(values.takenAt, timeZone);
      if (!instant) {
        setError('takenAt', { message: 'Enter a date and time, or leave it empty for now' });
        return;
      }
      takenAt = instant;
    }
    try {
      const result = await log.mutateAsync({ value: values.value, takenAt });
      setNotice(
        result.status === 'duplicate'
          ? { tone: 'info', text: 'That reading was already recorded; nothing was added.' }
          : { tone: 'success', text: `Reading saved: ${formatMeter(values.value, unit)}.` },
      );
      reset({ value: undefined as unknown as number, takenAt: '' });
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['value', 'takenAt']));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Log a reading" className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Meter reading"
          hint={
            latest
              ? `As the meter shows it (${unit}). Last: ${formatMeter(latest.value, unit)} on ${formatDateTime(latest.takenAt, timeZone)}.`
              : `As the meter shows it (${unit}).`
          }
          type="text"
          inputMode="decimal"
          autoComplete="off"
          className="text-lg font-bold"
          error={errors.value?.message}
          {...register('value', meterValueAs(units))}
        />
        <TextField
          label="Time taken"
          hint={`Optional; empty means now. Farm time (${formatTimeZoneName(timeZone)}).`}
          type="datetime-local"
          max={toDateTimeLocalValue(new Date(), timeZone)}
          error={errors.takenAt?.message}
          {...register('takenAt')}
        />
      </div>
      <div>
        <Button type="submit" icon="plus" pending={isSubmitting} className="w-full sm:w-auto">
          Save reading
        </Button>
      </div>
    </form>
  );
}
