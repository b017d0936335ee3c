import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { METER_KIND_LABELS, METER_KINDS } from '../../../../shared/constants';
import { meterCreateSchema, meterUpdateSchema } from '../../../../shared/schemas/meters';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterName, useChangeMeter, type MachineMeterJson } from '../../../lib/meters';

const KIND_OPTIONS = METER_KINDS.map((kind) => ({ value: kind, label: METER_KIND_LABELS[kind] }));

// the rename form sends its one field; the server's update schema takes only what is sent
const renameSchema = meterUpdateSchema.pick({ label: true }).required();

/** "Add a meter": its kind (which fixes the unit) and an optional label. */
export function AddMeterForm({
  orgId,
  machineId,
  onDone,
}: {
  orgId: string;
  machineId: string;
  /** called with the new meter's name after it is saved, or with null on cancel */
  onDone: (added: string | null) => void;
}) {
  const change = useChangeMeter(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof meterCreateSchema>, unknown, z.output<typeof meterCreateSchema>>({
    resolver: zodResolver(meterCreateSchema),
    defaultValues: { kind: 'pto_hours', label: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await change.mutateAsync({ kind: 'add', input: values });
      onDone(meterName(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['kind', 'label']));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Add a meter"
      className="flex flex-col gap-4 rounded-xl border border-field-300 bg-white p-4"
    >
      <h4 className="text-lg font-black text-field-950">Add a meter</h4>
      {formError ? <Alert>{formError}</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Kind"
          hint="The kind sets the unit: hours, bales, km, miles, ha or acres."
          options={KIND_OPTIONS}
          error={errors.kind?.message}
          {...register('kind')}
        />
        <TextField
          label="Label"
          hint="Optional; tells two meters of one kind apart (“rear PTO”)."
          autoComplete="off"
          error={errors.label?.message}
          {...register('label')}
        />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" icon="plus" pending={isSubmitting}>
          Add meter
        </Button>
        <Button variant="secondary" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** Renames a meter: only its label changes (its kind stays, as its readings are in it). */
export function RenameMeterForm({
  orgId,
  machineId,
  meter,
  onDone,
}: {
  orgId: string;
  machineId: string;
  meter: MachineMeterJson;
  onDone: (renamed: string | null) => void;
}) {
  const change = useChangeMeter(orgId, machineId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof renameSchema>, unknown, z.output<typeof renameSchema>>({
    resolver: zodResolver(renameSchema),
    defaultValues: { label: meter.label },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await change.mutateAsync({ kind: 'update', meterId: meter.id, input: values });
      onDone(meterName({ kind: meter.kind, label: values.label }));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['label']));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Rename ${meterName(meter)}`}
      className="flex flex-col gap-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      <TextField
        label="Label"
        hint="Empty leaves only the kind as its name."
        autoComplete="off"
        error={errors.label?.message}
        {...register('label')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={isSubmitting}>
          Save name
        </Button>
        <Button variant="secondary" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
