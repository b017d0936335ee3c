import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { HAZARDS, taskInputSchema, type TaskInput } from '../../../../shared/schemas/schedule';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { SelectField, TextField } from '../../../components/ui/field';
import { meterName, type MachineMeterJson } from '../../../lib/meters';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterUnitLabel } from '../../../lib/fleet-format';
import { HAZARD_LABELS } from '../lib/hazards';
import { taskFieldNames, type TaskFormApi, type TaskFormInput } from '../lib/task-form-values';
import { TaskIntervalFields } from './task-interval-fields';
import { TaskDailyCareField } from './task-daily-care';
import { TaskFluidsFields, TaskPartsFields } from './task-line-fields';

const HAZARD_OPTIONS = HAZARDS.map((value) => ({ value, label: HAZARD_LABELS[value] }));

interface TaskFormProps {
  /** the machine's meter unit, for the labels of meter figures */
  unit: string;
  initial: TaskInput;
  submitLabel: string;
  /** `meterId`: the meter chosen when the machine has several (its primary otherwise) */
  onSubmit: (values: TaskInput, meterId?: string) => Promise<unknown>;
  /** the machine's meters (primary first): with several, the task counts on the one chosen */
  meters?: MachineMeterJson[];
  onCancel: () => void;
  /** accessible name of the form ("Edit Engine oil and filter") */
  label: string;
}

/** Every field of a schedule task: intervals, warning window, parts, fluids, labour, safety. */
export function TaskForm({
  unit,
  initial,
  submitLabel,
  onSubmit,
  onCancel,
  label,
  meters = [],
}: TaskFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [meterId, setMeterId] = useState(meters[0]?.id ?? '');
  const meter = meters.find((m) => m.id === meterId);
  const form: TaskFormApi = useForm<TaskFormInput, unknown, TaskInput>({
    resolver: zodResolver(taskInputSchema),
    defaultValues: initial,
  });
  const {
    register,
    control,
    handleSubmit,
    setError,
    getValues,
    formState: { errors, isSubmitting },
  } = form;
  // a task's interval is in its meter's unit
  const unitWord = meterUnitLabel(meter?.unit ?? unit);

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values, meters.length > 1 ? meterId : undefined);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, taskFieldNames(getValues())));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={label} className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="Task name"
        autoComplete="off"
        error={errors.name?.message}
        {...register('name')}
      />

      {meters.length > 1 ? (
        <SelectField
          label="Counts on meter"
          hint="The meter the interval is counted on, in its unit."
          value={meterId}
          onChange={(e) => setMeterId(e.target.value)}
          error={errors.root?.message}
          options={meters.map((m) => ({ value: m.id, label: meterName(m) }))}
        />
      ) : null}

      <TaskIntervalFields form={form} unitWord={unitWord} />

      <TaskDailyCareField form={form} />

      <TaskPartsFields form={form} />

      <TaskFluidsFields form={form} />

      <TextareaField
        label="Instructions"
        rows={4}
        error={errors.instructions?.message}
        {...register('instructions')}
      />

      <Controller
        control={control}
        name="hazards"
        render={({ field, fieldState }) => (
          <CheckboxGroup
            legend="Hazards"
            hint="Tasks with a hazard show a caution beside them."
            options={HAZARD_OPTIONS}
            value={field.value ?? []}
            onChange={field.onChange}
            error={fieldState.error?.message}
          />
        )}
      />
      <TextareaField
        label="Safety notes"
        rows={3}
        hint="Shown with the caution, in the words of the manual where possible."
        error={errors.safetyNotes?.message}
        {...register('safetyNotes')}
      />

      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting}>
          {submitLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
