import { useEffect, useState } from 'react';
import { METER_UNIT_LABELS, type MeterUnit, type UnitSystem } from '../../../../shared/constants';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { formatDateTime, formatTimeZoneName } from '../../../lib/format';
import {
  formatMeter,
  fromDateTimeLocalValue,
  toDateTimeLocalValue,
} from '../../../lib/fleet-format';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import { meterName, useCounterReset, type MachineMeterJson } from '../../../lib/meters';
import { isCountingMeter, isCountingUnit } from '../../../../shared/domain/meter-kinds';
import { useLogReading } from '../api/log-reading';
import type { Reading } from '../api/types';
import { newReadingFormSchema } from '../lib/reading-form-schema';

interface ReadingFormProps {
  orgId: string;
  machineId: string;
  unit: string;
  /** the farm's units: how a typed comma is read */
  units: UnitSystem;
  timeZone: string;
  /** the newest reading, as the meter showed it, for the hint */
  latest: Reading | null;
  /** the machine's meters (primary first); a choice appears when there is more than one */
  meters?: MachineMeterJson[];
}

const EMPTY = {
  value: undefined as unknown as number,
  takenAt: '',
  meterId: '',
  reset: false,
  oldFinalValue: undefined,
};

/**
 * "Log a reading": the meter as it shows now, optionally when it was read; on which meter when
 * the machine has several; or "counter was reset" (a bale counter zeroed), recorded like a
 * meter replacement so the meter's lifetime runs on.
 */
export function ReadingForm(props: ReadingFormProps) {
  const { orgId, machineId, units, timeZone, meters = [] } = props;
  const log = useLogReading(orgId, machineId);
  const resetCounter = useCounterReset(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ tone: 'success' | 'info'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    setValue,
    watch,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: withMeterReasons(zodResolver(newReadingFormSchema)),
    defaultValues: EMPTY,
  });
  const chosen = meters.find((m) => m.id === watch('meterId')) ?? meters[0];
  const unit = chosen ? METER_UNIT_LABELS[chosen.unit as MeterUnit] : props.unit;
  const last = chosen && meters.length > 1 ? chosen.lastReading : props.latest;
  // a counter reset belongs to counting meters only (a bale counter), never an hour meter
  const counting = chosen ? isCountingMeter(chosen.kind) : isCountingUnit(props.unit as MeterUnit);
  const resetting = counting && watch('reset');
  // another meter chosen: a tick left from a counting meter would ask for a count before a reset
  useEffect(() => {
    if (!counting) setValue('reset', false);
  }, [counting, setValue]);

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
    const meterId = values.meterId || undefined;
    try {
      if (counting && values.reset) {
        await resetCounter.mutateAsync({
          meterId,
          oldFinalValue: values.oldFinalValue!,
          newStartValue: values.value,
          resetAt: takenAt ?? new Date().toISOString(),
        });
        setNotice({
          tone: 'success',
          text: `Counter reset saved: ${formatMeter(values.oldFinalValue!, unit)} before, ${formatMeter(values.value, unit)} after.`,
        });
      } else {
        const result = await log.mutateAsync({ value: values.value, takenAt, meterId });
        setNotice(
          result.status === 'duplicate'
            ? { tone: 'info', text: 'That reading was already recorded; nothing was added.' }
            : { tone: 'success', text: `Reading saved: ${formatMeter(values.value, unit)}.` },
        );
      }
      reset({ ...EMPTY, meterId: values.meterId });
    } catch (error) {
      setFormError(
        applyServerErrors(error, setError, ['value', 'takenAt', 'meterId', 'oldFinalValue']),
      );
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Log a reading" className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      {meters.length > 1 ? (
        <SelectField
          label="Meter"
          hint="Which of the machine's meters you read."
          error={errors.meterId?.message}
          options={meters.map((m) => ({
            value: m.isPrimary ? '' : m.id,
            label: `${meterName(m)}${m.isPrimary ? ' (primary)' : ''}`,
          }))}
          {...register('meterId')}
        />
      ) : null}
      {counting ? (
        <label className="flex min-h-touch items-center gap-3 font-bold text-field-900">
          <input type="checkbox" className="size-5" {...register('reset')} />
          Counter was reset
        </label>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        {resetting ? (
          <TextField
            label="Count before the reset"
            hint={`What the counter showed just before it was zeroed (${unit}).`}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            error={errors.oldFinalValue?.message}
            {...register('oldFinalValue', meterValueAs(units))}
          />
        ) : null}
        <TextField
          label={resetting ? 'Count after the reset' : 'Meter reading'}
          hint={
            resetting
              ? `Usually 0 (${unit}).`
              : last
                ? `As the meter shows it (${unit}). Last: ${formatMeter(last.value, unit)} on ${formatDateTime(last.takenAt, timeZone)}.`
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
          label={resetting ? 'Reset at' : 'Time taken'}
          hint={`Optional; empty means now. Farm time (${formatTimeZoneName(timeZone)}).`}
          type="datetime-local"
          max={toDateTimeLocalValue(new Date(), timeZone)}
          error={errors.takenAt?.message}
          {...register('takenAt')}
        />
      </div>
      <div>
        <Button type="submit" icon="plus" pending={isSubmitting} className="w-full sm:w-auto">
          {resetting ? 'Save counter reset' : 'Save reading'}
        </Button>
      </div>
    </form>
  );
}
