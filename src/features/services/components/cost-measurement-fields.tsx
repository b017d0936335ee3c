import type { UseFieldArrayReturn } from 'react-hook-form';
import { TextField } from '../../../components/ui/field';
import { MoneyField } from '../../../components/ui/money-field';
import {
  optionalNumber,
  requiredNumber,
  type ServiceForm,
  type ServiceFormInput,
} from '../lib/form-values';
import { LineList, LineRow } from './line-rows';

const decimal = { type: 'number', inputMode: 'decimal', step: 'any' } as const;

/** Costs that are not parts or fluids: outside work, consumables, a call-out. */
export function OtherCostsFields({
  form,
  rows,
  currency,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'otherCosts'>;
  /** the farm's currency: amounts are typed in it */
  currency: string;
}) {
  const {
    control,
    register,
    formState: { errors },
  } = form;
  return (
    <LineList
      legend="Other costs"
      emptyText="No other costs."
      addLabel="Add cost"
      onAdd={() => rows.append({ description: '', amountMinor: 0 })}
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => (
        <LineRow
          key={row.id}
          label={`Cost ${i + 1}`}
          columns="sm:grid-cols-[1fr_8rem_auto]"
          onRemove={() => rows.remove(i)}
        >
          <TextField
            label="Cost description"
            autoComplete="off"
            error={errors.otherCosts?.[i]?.description?.message}
            {...register(`otherCosts.${i}.description`)}
          />
          <MoneyField
            label="Amount"
            control={control}
            name={`otherCosts.${i}.amountMinor`}
            currency={currency}
            required
            error={errors.otherCosts?.[i]?.amountMinor?.message}
          />
        </LineRow>
      ))}
    </LineList>
  );
}

/** Readings taken during the visit, with the spec they are held to; the server judges in or out. */
export function MeasurementsFields({
  form,
  rows,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'measurements'>;
}) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <LineList
      legend="Measurements"
      hint="A pressure, a clearance, a voltage taken during the visit, with the manual's limits if it gives them. The record shows each as in spec, low or high, and the machine's page charts it over the visits."
      emptyText="No measurements."
      addLabel="Add measurement"
      onAdd={() =>
        rows.append({
          name: '',
          value: undefined as unknown as number,
          unit: '',
          specMin: null,
          specMax: null,
        })
      }
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => (
        <LineRow
          key={row.id}
          label={`Measurement ${i + 1}`}
          columns="sm:grid-cols-[1fr_6rem_5rem_6rem_6rem_auto]"
          onRemove={() => rows.remove(i)}
        >
          <TextField
            label="Measurement name"
            autoComplete="off"
            placeholder="PTO clutch pressure"
            error={errors.measurements?.[i]?.name?.message}
            {...register(`measurements.${i}.name`)}
          />
          <TextField
            label="Value"
            {...decimal}
            error={errors.measurements?.[i]?.value?.message}
            {...register(`measurements.${i}.value`, requiredNumber)}
          />
          <TextField
            label="Unit"
            autoComplete="off"
            placeholder="psi"
            error={errors.measurements?.[i]?.unit?.message}
            {...register(`measurements.${i}.unit`)}
          />
          <TextField
            label="Spec min"
            {...decimal}
            error={errors.measurements?.[i]?.specMin?.message}
            {...register(`measurements.${i}.specMin`, optionalNumber)}
          />
          <TextField
            label="Spec max"
            {...decimal}
            error={errors.measurements?.[i]?.specMax?.message}
            {...register(`measurements.${i}.specMax`, optionalNumber)}
          />
        </LineRow>
      ))}
    </LineList>
  );
}
