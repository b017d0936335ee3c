import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { meterReplacementSchema } from '../../../../shared/schemas/readings';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import {
  formatMeter,
  meterUnitLabel,
  fromDateTimeLocalValue,
  toDateTimeLocalValue,
} from '../../../lib/fleet-format';
import { useRecordMeterReplacement } from '../api/record-meter-replacement';
import { formatTimeZoneName } from '../../../lib/format';

// As the server's schema, with the time as the farm's wall-clock text until submit.
const formSchema = meterReplacementSchema.extend({
  replacedAt: z.string().min(1, { error: 'Enter when the meter was replaced' }),
});

/**
 * A new meter fitted in place of one of the machine's meters (any of them: engine, separator,
 * PTO…): the old one's last value and the new one's first, so that meter's lifetime stays
 * continuous. The others are untouched.
 */
export function MeterReplacementForm({
  orgId,
  machineId,
  meterId,
  meterLabel,
  unit,
  units,
  timeZone,
  onDone,
}: {
  orgId: string;
  machineId: string;
  /** the meter replaced (machine_meters.id) */
  meterId: string;
  /** how the meter is named on screen ("Separator hours") */
  meterLabel: string;
  unit: string;
  units: UnitSystem;
  timeZone: string;
  onDone: (message: string) => void;
}) {
  const record = useRecordMeterReplacement(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: withMeterReasons(zodResolver(formSchema)),
    defaultValues: {
      oldFinalValue: undefined as unknown as number,
      newStartValue: 0,
      replacedAt: toDateTimeLocalValue(new Date(), timeZone),
      note: '',
    },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    const replacedAt = fromDateTimeLocalValue(values.replacedAt, timeZone);
    if (!replacedAt) {
      setError('replacedAt', { message: 'Enter a date and time' });
      return;
    }
    try {
      await record.mutateAsync({ ...values, meterId, replacedAt });
      onDone(
        `Meter replacement recorded on ${meterLabel}: the new meter starts at ${formatMeter(values.newStartValue, unit)}.`,
      );
    } catch (error) {
      setFormError(
        applyServerErrors(error, setError, [
          'oldFinalValue',
          'newStartValue',
          'replacedAt',
          'note',
        ]),
      );
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Record meter replacement of ${meterLabel}`}
      className="flex flex-col gap-4 rounded-xl border border-field-300 bg-white p-4"
    >
      <h3 className="text-lg font-black text-field-950">Record meter replacement</h3>
      <p className="text-field-700">
        A new meter in place of {meterLabel}: its readings after the replacement count from the new
        meter's start, and its lifetime {meterUnitLabel(unit)} carry on without a jump. The
        machine's other meters are not changed.
      </p>
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Old meter final value"
          hint={`The last figure the old meter showed (${unit})`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          error={errors.oldFinalValue?.message}
          {...register('oldFinalValue', meterValueAs(units))}
        />
        <TextField
          label="New meter start value"
          hint={`What the new meter showed when fitted (${unit})`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          error={errors.newStartValue?.message}
          {...register('newStartValue', meterValueAs(units))}
        />
        <TextField
          label="Replaced at"
          hint={`Farm time (${formatTimeZoneName(timeZone)})`}
          type="datetime-local"
          error={errors.replacedAt?.message}
          {...register('replacedAt')}
        />
      </div>
      <TextareaField label="Note" rows={2} error={errors.note?.message} {...register('note')} />
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting}>
          Record replacement
        </Button>
        <Button variant="secondary" onClick={() => onDone('')}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
