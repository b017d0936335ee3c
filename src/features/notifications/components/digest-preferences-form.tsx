import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { CATEGORY_LABELS, MACHINE_CATEGORIES } from '../../../../shared/constants';
import {
  DIGEST_FREQUENCIES,
  DIGEST_FREQUENCY_LABELS,
  DIGEST_HORIZON_DAYS,
  notificationPreferenceSchema,
  WEEKDAY_LABELS,
} from '../../../../shared/schemas/notifications';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { cx } from '../../../components/ui/cx';
import { SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSavePreferences } from '../api/save-preferences';
import type { ReminderPreferences } from '../api/types';
import { hourLabel } from './digest-hour-form';
import { formatTimeZoneName } from '../../../lib/format';

interface DigestPreferencesFormProps {
  orgId: string;
  preferences: ReminderPreferences;
}

const WEEKDAY_OPTIONS = WEEKDAY_LABELS.map((label, index) => ({
  value: String(index + 1),
  label,
}));
const CATEGORY_OPTIONS = MACHINE_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }));

/** The person's own due digest: how often, and which machines or categories it covers. */
export function DigestPreferencesForm({ orgId, preferences }: DigestPreferencesFormProps) {
  const save = useSavePreferences(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const { data: current, meta } = preferences;
  const {
    control,
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(notificationPreferenceSchema),
    defaultValues: {
      frequency: current.frequency,
      weekday: current.weekday,
      machineIds: current.machineIds,
      categories: current.categories,
    },
  });
  const frequency = useWatch({ control, name: 'frequency' });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      await save.mutateAsync(values);
      setSaved(true);
    } catch (error) {
      setFormError(
        applyServerErrors(error, setError, ['frequency', 'weekday', 'machineIds', 'categories']),
      );
    }
  });

  const machineOptions = meta.machines.map((m) => ({
    value: m.id,
    label: `${m.fleetNumber} · ${m.name}`,
  }));

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      {saved ? <Alert tone="success">Saved. The next digest follows these choices.</Alert> : null}
      {current.isDefault ? (
        <Alert tone="info">
          {current.frequency === 'daily'
            ? 'Managers and technicians get the due list every day until they choose otherwise.'
            : 'Operators get no due list until they ask for one here.'}
        </Alert>
      ) : null}

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1.5 font-bold text-field-900">How often</legend>
        <p className="-mt-1 text-sm text-field-600">
          Overdue, due soon and what the forecast brings due in the next {DIGEST_HORIZON_DAYS} days,
          per machine. It goes out after {hourLabel(meta.digestHour)} (
          {formatTimeZoneName(meta.timeZone)}) and only when something is due.
        </p>
        <div className="grid gap-2 sm:grid-cols-3">
          {DIGEST_FREQUENCIES.map((value) => (
            <label
              key={value}
              className={cx(
                'flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border border-field-200 bg-white px-3 py-2',
                'has-[:checked]:border-field-600 has-[:checked]:bg-field-50',
              )}
            >
              <input
                type="radio"
                value={value}
                className="size-5 accent-field-800"
                {...register('frequency')}
              />
              <span>{DIGEST_FREQUENCY_LABELS[value]}</span>
            </label>
          ))}
        </div>
        {errors.frequency?.message ? (
          <p className="text-sm font-bold text-poppy-700">{errors.frequency.message}</p>
        ) : null}
      </fieldset>

      {frequency === 'weekly' ? (
        <SelectField
          label="Day of the week"
          options={WEEKDAY_OPTIONS}
          error={errors.weekday?.message}
          {...register('weekday', { valueAsNumber: true })}
        />
      ) : null}

      {frequency !== 'off' ? (
        <>
          {machineOptions.length ? (
            <Controller
              control={control}
              name="machineIds"
              render={({ field }) => (
                <CheckboxGroup
                  legend="Only these machines"
                  hint="Leave all unticked for every machine you can see."
                  options={machineOptions}
                  value={field.value ?? []}
                  onChange={field.onChange}
                  columns={2}
                  error={errors.machineIds?.message}
                />
              )}
            />
          ) : null}
          <Controller
            control={control}
            name="categories"
            render={({ field }) => (
              <CheckboxGroup
                legend="Only these kinds of machine"
                hint="Leave all unticked for every kind."
                options={CATEGORY_OPTIONS}
                value={field.value ?? []}
                onChange={field.onChange}
                error={errors.categories?.message}
              />
            )}
          />
        </>
      ) : null}

      <div>
        <Button type="submit" icon="check" pending={isSubmitting} className="w-full sm:w-auto">
          Save reminders
        </Button>
      </div>
    </form>
  );
}
