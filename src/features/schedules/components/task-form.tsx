import { useState } from 'react';
import { Controller, useFieldArray, useForm, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  FLUID_UNITS,
  HAZARDS,
  taskInputSchema,
  type TaskInput,
} from '../../../../shared/schemas/schedule';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { SelectField, TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterUnitLabel } from '../../../lib/fleet-format';
import type { Task } from '../api/types';
import { HAZARD_LABELS } from '../lib/hazards';

const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v == null ? null : Number(v)) };
const requiredNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? undefined : Number(v)),
};

const HAZARD_OPTIONS = HAZARDS.map((value) => ({ value, label: HAZARD_LABELS[value] }));
const UNIT_OPTIONS = FLUID_UNITS.map((value) => ({ value, label: value }));

const SCALAR_FIELDS = [
  'name',
  'intervalMeter',
  'intervalDays',
  'firstServiceMeter',
  'warnMeter',
  'warnDays',
  'labourHours',
  'instructions',
  'safetyNotes',
  'hazards',
  'parts',
  'fluids',
] as const;

export const emptyTask = (): TaskInput => ({
  name: '',
  intervalMeter: null,
  intervalDays: null,
  firstServiceMeter: null,
  warnMeter: null,
  warnDays: null,
  parts: [],
  fluids: [],
  labourHours: null,
  instructions: '',
  safetyNotes: '',
  hazards: [],
});

export const taskToInput = (task: Task): TaskInput => ({
  name: task.name,
  intervalMeter: task.intervalMeter,
  intervalDays: task.intervalDays,
  firstServiceMeter: task.firstServiceMeter,
  warnMeter: task.warnMeter,
  warnDays: task.warnDays,
  parts: task.parts.map((p) => ({ ...p })),
  fluids: task.fluids.map((f) => ({ ...f })),
  labourHours: task.labourHours,
  instructions: task.instructions,
  safetyNotes: task.safetyNotes,
  hazards: [...task.hazards],
});

interface TaskFormProps {
  /** the machine's meter unit, for the labels of meter figures */
  unit: string;
  initial: TaskInput;
  submitLabel: string;
  onSubmit: (values: TaskInput) => Promise<unknown>;
  onCancel: () => void;
  /** accessible name of the form ("Edit Engine oil and filter") */
  label: string;
}

/** Every field of a schedule task: intervals, warning window, parts, fluids, labour, safety. */
export function TaskForm({ unit, initial, submitLabel, onSubmit, onCancel, label }: TaskFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(taskInputSchema), defaultValues: initial });
  const parts = useFieldArray({ control, name: 'parts' });
  const fluids = useFieldArray({ control, name: 'fluids' });
  const unitWord = meterUnitLabel(unit);

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (error) {
      const current = getValues();
      const rowFields = [
        ...(current.parts ?? []).flatMap((_, i) =>
          (['partNumber', 'description', 'quantity'] as const).map((f) => `parts.${i}.${f}`),
        ),
        ...(current.fluids ?? []).flatMap((_, i) =>
          (['kind', 'volume', 'unit'] as const).map((f) => `fluids.${i}.${f}`),
        ),
      ] as Path<TaskInput>[];
      setFormError(applyServerErrors(error, setError, [...SCALAR_FIELDS, ...rowFields]));
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

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-black text-field-900">Interval</legend>
        <p className="-mt-1 text-sm text-field-600">
          Take the figures from this machine's operator's manual. Give a meter interval, a day
          interval or both (whichever comes first).
        </p>
        <div className="grid gap-4 sm:grid-cols-3">
          <TextField
            label="Meter interval"
            hint={`In ${unitWord}`}
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            error={errors.intervalMeter?.message}
            {...register('intervalMeter', optionalNumber)}
          />
          <TextField
            label="Day interval"
            hint="In days"
            type="number"
            inputMode="numeric"
            min={1}
            error={errors.intervalDays?.message}
            {...register('intervalDays', optionalNumber)}
          />
          <TextField
            label="First service point"
            hint={`Break-in service, in ${unitWord}`}
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            error={errors.firstServiceMeter?.message}
            {...register('firstServiceMeter', optionalNumber)}
          />
          <TextField
            label="Warning window (meter)"
            hint={`"Due soon" this many ${unitWord} before`}
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            error={errors.warnMeter?.message}
            {...register('warnMeter', optionalNumber)}
          />
          <TextField
            label="Warning window (days)"
            hint='"Due soon" this many days before'
            type="number"
            inputMode="numeric"
            min={1}
            error={errors.warnDays?.message}
            {...register('warnDays', optionalNumber)}
          />
          <TextField
            label="Estimated labour"
            hint="In hours of work"
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            error={errors.labourHours?.message}
            {...register('labourHours', optionalNumber)}
          />
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-black text-field-900">Parts</legend>
        {parts.fields.length === 0 ? <p className="text-field-600">No parts listed.</p> : null}
        {parts.fields.map((row, index) => (
          <div
            key={row.id}
            role="group"
            aria-label={`Part ${index + 1}`}
            className="grid gap-3 rounded-lg border border-field-200 p-3 sm:grid-cols-[1fr_2fr_7rem_auto] sm:items-start"
          >
            <TextField
              label="Part number"
              autoComplete="off"
              spellCheck={false}
              error={errors.parts?.[index]?.partNumber?.message}
              {...register(`parts.${index}.partNumber`)}
            />
            <TextField
              label="Description"
              autoComplete="off"
              error={errors.parts?.[index]?.description?.message}
              {...register(`parts.${index}.description`)}
            />
            <TextField
              label="Quantity"
              type="number"
              inputMode="decimal"
              step="any"
              min={0}
              error={errors.parts?.[index]?.quantity?.message}
              {...register(`parts.${index}.quantity`, requiredNumber)}
            />
            <Button
              variant="ghost"
              icon="trash"
              className="sm:mt-8"
              aria-label={`Remove part ${index + 1}`}
              onClick={() => parts.remove(index)}
            >
              Remove
            </Button>
          </div>
        ))}
        <div>
          <Button
            variant="secondary"
            icon="plus"
            onClick={() => parts.append({ partNumber: '', description: '', quantity: 1 })}
          >
            Add part
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-black text-field-900">Fluids</legend>
        {fluids.fields.length === 0 ? <p className="text-field-600">No fluids listed.</p> : null}
        {fluids.fields.map((row, index) => (
          <div
            key={row.id}
            role="group"
            aria-label={`Fluid ${index + 1}`}
            className="grid gap-3 rounded-lg border border-field-200 p-3 sm:grid-cols-[2fr_1fr_6rem_auto] sm:items-start"
          >
            <TextField
              label="Fluid kind"
              autoComplete="off"
              error={errors.fluids?.[index]?.kind?.message}
              {...register(`fluids.${index}.kind`)}
            />
            <TextField
              label="Volume"
              type="number"
              inputMode="decimal"
              step="any"
              min={0}
              error={errors.fluids?.[index]?.volume?.message}
              {...register(`fluids.${index}.volume`, requiredNumber)}
            />
            <SelectField
              label="Unit"
              options={UNIT_OPTIONS}
              error={errors.fluids?.[index]?.unit?.message}
              {...register(`fluids.${index}.unit`)}
            />
            <Button
              variant="ghost"
              icon="trash"
              className="sm:mt-8"
              aria-label={`Remove fluid ${index + 1}`}
              onClick={() => fluids.remove(index)}
            >
              Remove
            </Button>
          </div>
        ))}
        <div>
          <Button
            variant="secondary"
            icon="plus"
            onClick={() => fluids.append({ kind: '', volume: 1, unit: 'L' })}
          >
            Add fluid
          </Button>
        </div>
      </fieldset>

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
