import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  CATEGORY_LABELS,
  MACHINE_CATEGORIES,
  METER_UNITS,
  METER_UNIT_LABELS,
  MACHINE_STATUS_LABELS,
  type MachineStatus,
} from '../../../../shared/constants';
import {
  machineCreateSchema,
  type MachineCreateInput,
  type MachineUpdateInput,
} from '../../../../shared/schemas/machines';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { SelectField, TextField } from '../../../components/ui/field';
import { MoneyField } from '../../../components/ui/money-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { useCurrentMembership } from '../../../lib/auth';
import { changedFields } from '../../../lib/changed-fields';
import { applyServerErrors } from '../../../lib/form-errors';
import { useOperators } from '../api/get-operators';
import type { Machine } from '../api/types';
import { MONTH_OPTIONS } from '../lib/season-months';

const FIELD_NAMES = [
  'fleetNumber',
  'name',
  'category',
  'make',
  'model',
  'serialNumber',
  'telematicsId',
  'year',
  'purchasePriceMinor',
  'listPriceMinor',
  'meterUnit',
  'status',
  'seasonMonths',
  'operatorIds',
  'notes',
] as const;

const CATEGORY_OPTIONS = MACHINE_CATEGORIES.map((value) => ({
  value,
  label: CATEGORY_LABELS[value],
}));
const UNIT_OPTIONS = METER_UNITS.map((value) => ({
  value,
  label: `${METER_UNIT_LABELS[value]} (${value})`,
}));
// A tagged-out machine goes back into service by its own noted step on the machine page, not here.
const statusOptions = (current: MachineStatus) =>
  (current === 'tagged_out'
    ? (['tagged_out'] as const)
    : (['in_service', 'tagged_out', ...(current === 'sold' ? ['sold' as const] : [])] as const)
  ).map((value) => ({ value, label: MACHINE_STATUS_LABELS[value] }));

// Empty number inputs mean "not given" (null), not zero; anything else goes to the schema as a
// number, so "abc" is refused with the schema's own message.
const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v == null ? null : Number(v)) };

function defaultsFrom(machine: Machine | undefined): MachineCreateInput {
  return {
    fleetNumber: machine?.fleetNumber ?? '',
    name: machine?.name ?? '',
    category: machine?.category ?? 'tractor',
    make: machine?.make ?? '',
    model: machine?.model ?? '',
    serialNumber: machine?.serialNumber ?? '',
    telematicsId: machine?.telematicsId ?? null,
    year: machine?.year ?? null,
    purchasePriceMinor: machine?.purchasePriceMinor ?? null,
    listPriceMinor: machine?.listPriceMinor ?? null,
    meterUnit: machine?.meterUnit ?? 'h',
    status: machine?.status ?? 'in_service',
    seasonMonths: machine?.seasonMonths ?? [],
    operatorIds: machine?.operatorIds ?? [],
    notes: machine?.notes ?? '',
  };
}

interface MachineFormProps {
  orgId: string;
  /** the machine being edited; a new machine without it */
  machine?: Machine;
  submitLabel: string;
  /** every value (to create), and the fields changed from the machine's (to edit: send only those) */
  onSubmit: (values: MachineCreateInput, changed: MachineUpdateInput) => Promise<unknown>;
  onCancel?: () => void;
}

/** Every field of a machine, for adding one and for editing it. The server's errors go beside the fields. */
export function MachineForm({ orgId, machine, submitLabel, onSubmit, onCancel }: MachineFormProps) {
  const operators = useOperators(orgId);
  const { currency } = useCurrentMembership().membership.organization;
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(machineCreateSchema),
    defaultValues: defaultsFrom(machine),
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values, changedFields(defaultsFrom(machine), values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, FIELD_NAMES));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      {formError ? <Alert>{formError}</Alert> : null}

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-3 text-lg font-black text-field-900">The machine</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField
            label="Fleet number"
            hint="Unique on this farm, e.g. T-04"
            autoComplete="off"
            spellCheck={false}
            error={errors.fleetNumber?.message}
            {...register('fleetNumber')}
          />
          <TextField
            label="Name"
            autoComplete="off"
            error={errors.name?.message}
            {...register('name')}
          />
          <SelectField
            label="Category"
            options={CATEGORY_OPTIONS}
            error={errors.category?.message}
            {...register('category')}
          />
          <SelectField
            label="Status"
            options={statusOptions(machine?.status ?? 'in_service')}
            hint={
              machine?.status === 'tagged_out'
                ? 'Tagged out: it goes back into service with "Return to service" at the top of its page, with a note of what was checked.'
                : 'A tagged-out machine is shown to operators as not to be used.'
            }
            error={errors.status?.message}
            {...register('status')}
          />
          <TextField
            label="Make"
            autoComplete="off"
            error={errors.make?.message}
            {...register('make')}
          />
          <TextField
            label="Model"
            autoComplete="off"
            error={errors.model?.message}
            {...register('model')}
          />
          <TextField
            label="Serial number"
            autoComplete="off"
            spellCheck={false}
            error={errors.serialNumber?.message}
            {...register('serialNumber')}
          />
          <TextField
            label="Telematics id"
            hint="The id a telematics feed sends for this machine, if it is not the serial number"
            autoComplete="off"
            spellCheck={false}
            error={errors.telematicsId?.message}
            {...register('telematicsId', { setValueAs: (v: unknown) => (v ? String(v) : null) })}
          />
          <TextField
            label="Year"
            type="number"
            inputMode="numeric"
            min={1900}
            max={2100}
            error={errors.year?.message}
            {...register('year', optionalNumber)}
          />
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-3 text-lg font-black text-field-900">Meter and costs</legend>
        <div className="grid gap-4 sm:grid-cols-3">
          <SelectField
            label="Meter unit"
            options={UNIT_OPTIONS}
            hint="What the machine's meter counts"
            error={errors.meterUnit?.message}
            {...register('meterUnit')}
          />
          <MoneyField
            label="Purchase price"
            control={control}
            name="purchasePriceMinor"
            currency={currency}
            error={errors.purchasePriceMinor?.message}
          />
          <MoneyField
            label="List price"
            control={control}
            name="listPriceMinor"
            currency={currency}
            hint="New list price, for the repair-cost model"
            error={errors.listPriceMinor?.message}
          />
        </div>
      </fieldset>

      <Controller
        control={control}
        name="seasonMonths"
        render={({ field, fieldState }) => (
          <CheckboxGroup
            legend="Season months"
            hint="The months the machine works. Leave all clear for a machine used all year."
            options={MONTH_OPTIONS}
            value={field.value ?? []}
            onChange={field.onChange}
            error={fieldState.error?.message}
            columns={4}
          />
        )}
      />

      <Controller
        control={control}
        name="operatorIds"
        render={({ field, fieldState }) =>
          operators.isError ? (
            <Alert tone="warning">
              The operators didn't load, so assignments can't be changed now.
            </Alert>
          ) : (
            <CheckboxGroup
              legend="Assigned operators"
              hint={
                operators.isPending
                  ? 'Loading operators…'
                  : operators.data.length === 0
                    ? 'No operators on the team yet.'
                    : 'Operators see the machines assigned to them, and machines assigned to no one.'
              }
              options={(operators.data ?? []).map((o) => ({ value: o.userId, label: o.name }))}
              value={field.value ?? []}
              onChange={field.onChange}
              error={fieldState.error?.message}
            />
          )
        }
      />

      <TextareaField label="Notes" rows={4} error={errors.notes?.message} {...register('notes')} />

      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting} className="sm:w-auto">
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
