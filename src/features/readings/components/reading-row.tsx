import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime, formatTimeZoneName } from '../../../lib/format';
import {
  formatMeter,
  fromDateTimeLocalValue,
  toDateTimeLocalValue,
} from '../../../lib/fleet-format';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import { useCorrectReading } from '../api/correct-reading';
import { useDeleteReading } from '../api/delete-reading';
import type { MeterReplacement, Reading } from '../api/types';
import { readingFormSchema } from '../lib/reading-form-schema';

const SOURCE_LABELS: Record<Reading['source'], string> = {
  manual: 'Entered',
  walkaround: 'Walkaround',
  import: 'Imported',
  service: 'Service',
  telematics: 'Telematics',
  hitch: 'From hitching',
};

/** Where a reading came from: by hand, an import, a walkaround… or which telematics key sent it. */
const sourceLabel = (reading: Reading) => {
  const label = SOURCE_LABELS[reading.source] ?? reading.source;
  return reading.sourceName ? `${label} · ${reading.sourceName}` : label;
};

interface ReadingRowProps {
  orgId: string;
  machineId: string;
  reading: Reading;
  /** a meter replacement between this reading and the previous one */
  replacementBefore: MeterReplacement | null;
  unit: string;
  units: UnitSystem;
  timeZone: string;
  canCorrect: boolean;
}

export function ReadingRow({
  orgId,
  machineId,
  reading,
  replacementBefore,
  unit,
  units,
  timeZone,
  canCorrect,
}: ReadingRowProps) {
  const [editing, setEditing] = useState(false);
  const [confirmingDelete, setConfirmingDelete] = useState(false);
  const remove = useDeleteReading(orgId, machineId);
  const when = formatDateTime(reading.takenAt, timeZone);
  const shown = formatMeter(reading.value, unit);
  const lifetimeDiffers = Math.abs(reading.lifetimeValue - reading.value) > 1e-9;

  return (
    <>
      <li className="flex flex-col gap-2 p-3 sm:flex-row sm:items-center">
        <div className="flex min-w-0 flex-1 flex-col">
          <span className="text-lg font-black text-field-950 tabular-nums">{shown}</span>
          {lifetimeDiffers ? (
            <span className="text-sm text-field-700">
              Lifetime {formatMeter(reading.lifetimeValue, unit)}
            </span>
          ) : null}
          <span className="flex flex-wrap items-center gap-2 text-sm text-field-600">
            <time dateTime={reading.takenAt}>{when}</time>
            <Badge>{sourceLabel(reading)}</Badge>
          </span>
        </div>
        {canCorrect && !editing ? (
          <div className="flex gap-2">
            <Button
              variant="secondary"
              aria-label={`Correct ${shown} of ${when}`}
              onClick={() => setEditing(true)}
            >
              Correct
            </Button>
            <Button
              variant="ghost"
              icon="trash"
              aria-label={`Delete ${shown} of ${when}`}
              onClick={() => setConfirmingDelete(true)}
            >
              Delete
            </Button>
          </div>
        ) : null}
      </li>
      {editing ? (
        <li className="bg-oat-50 p-3">
          <CorrectReadingForm
            orgId={orgId}
            machineId={machineId}
            reading={reading}
            unit={unit}
            units={units}
            timeZone={timeZone}
            onDone={() => setEditing(false)}
          />
        </li>
      ) : null}
      {replacementBefore ? (
        <li className="flex items-start gap-2 bg-sky-50 p-3 text-sky-900">
          <Icon name="refresh" className="mt-0.5 size-5" />
          {replacementBefore.kind === 'reset' ? (
            <span>
              <span className="font-bold">Counter reset</span>{' '}
              {formatDateTime(replacementBefore.replacedAt, timeZone)}: counted{' '}
              {formatMeter(replacementBefore.oldFinalValue, unit)} before, started again at{' '}
              {formatMeter(replacementBefore.newStartValue, unit)}; the lifetime count runs on.
              {replacementBefore.note ? ` ${replacementBefore.note}` : ''}
            </span>
          ) : (
            <span>
              <span className="font-bold">Meter replaced</span>{' '}
              {formatDateTime(replacementBefore.replacedAt, timeZone)}: old meter ended at{' '}
              {formatMeter(replacementBefore.oldFinalValue, unit)}, new meter started at{' '}
              {formatMeter(replacementBefore.newStartValue, unit)}.
              {replacementBefore.note ? ` ${replacementBefore.note}` : ''}
            </span>
          )}
        </li>
      ) : null}
      <ConfirmDialog
        open={confirmingDelete}
        title="Delete this reading?"
        confirmLabel="Delete reading"
        pending={remove.isPending}
        error={
          remove.error
            ? isApiError(remove.error)
              ? remove.error.message
              : 'Could not delete the reading. Try again.'
            : null
        }
        onCancel={() => {
          setConfirmingDelete(false);
          remove.reset();
        }}
        onConfirm={() => remove.mutate(reading.id, { onSuccess: () => setConfirmingDelete(false) })}
      >
        {shown} of {when} leaves the history, and the usage estimate and due dates are worked out
        again without it. The deletion is recorded in the audit log.
      </ConfirmDialog>
    </>
  );
}

function CorrectReadingForm({
  orgId,
  machineId,
  reading,
  unit,
  units,
  timeZone,
  onDone,
}: {
  orgId: string;
  machineId: string;
  reading: Reading;
  unit: string;
  units: UnitSystem;
  timeZone: string;
  onDone: () => void;
}) {
  const correct = useCorrectReading(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const initial = {
    value: reading.value,
    takenAt: toDateTimeLocalValue(reading.takenAt, timeZone),
  };
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: withMeterReasons(zodResolver(readingFormSchema)),
    defaultValues: initial,
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    const takenAt = fromDateTimeLocalValue(values.takenAt, timeZone);
    if (!takenAt) {
      setError('takenAt', { message: 'Enter a date and time' });
      return;
    }
    try {
      // only what changed: an untouched time keeps its seconds (the field shows minutes)
      await correct.mutateAsync({
        readingId: reading.id,
        ...(values.value !== initial.value && { value: values.value }),
        ...(values.takenAt !== initial.takenAt && { takenAt }),
      });
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['value', 'takenAt']));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Correct reading" className="flex flex-col gap-3">
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Corrected meter reading"
          hint={`As the meter showed it (${unit})`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          autoFocus
          error={errors.value?.message}
          {...register('value', meterValueAs(units))}
        />
        <TextField
          label="Corrected time taken"
          hint={`Farm time (${formatTimeZoneName(timeZone)})`}
          type="datetime-local"
          error={errors.takenAt?.message}
          {...register('takenAt')}
        />
      </div>
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting}>
          Save correction
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
