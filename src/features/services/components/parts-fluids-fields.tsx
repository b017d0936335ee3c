import type { UseFieldArrayReturn } from 'react-hook-form';
import { SelectField, TextField } from '../../../components/ui/field';
import { MoneyField } from '../../../components/ui/money-field';
import { FLUID_UNIT_OPTIONS } from '../lib/fluid-units';
import { requiredNumber, type ServiceForm, type ServiceFormInput } from '../lib/form-values';
import { LineList, LineRow } from './line-rows';

const decimal = { type: 'number', inputMode: 'decimal', step: 'any', min: 0 } as const;

/** The parts used (or to pull, on a plan): prefilled from the tasks, every line editable. */
export function PartsFields({
  form,
  rows,
  showCosts,
  currency,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'parts'>;
  showCosts: boolean;
  /** the farm's currency: unit costs are typed in it */
  currency: string;
}) {
  const {
    control,
    register,
    formState: { errors },
  } = form;
  return (
    <LineList
      legend="Parts"
      hint={
        showCosts
          ? "Filled in from the chosen tasks' parts lists; change any line to what was actually used."
          : "Filled in from the chosen tasks' parts lists; change any line to what the visit needs."
      }
      emptyText="No parts."
      addLabel="Add part"
      onAdd={() =>
        rows.append({ partNumber: '', description: '', quantity: 1, unitCostMinor: null })
      }
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => (
        <LineRow
          key={row.id}
          label={`Part ${i + 1}`}
          columns={
            showCosts
              ? 'sm:grid-cols-[9rem_1fr_6rem_7rem_auto]'
              : 'sm:grid-cols-[9rem_1fr_6rem_auto]'
          }
          onRemove={() => rows.remove(i)}
        >
          <TextField
            label="Part number"
            autoComplete="off"
            spellCheck={false}
            error={errors.parts?.[i]?.partNumber?.message}
            {...register(`parts.${i}.partNumber`)}
          />
          <TextField
            label="Description"
            autoComplete="off"
            error={errors.parts?.[i]?.description?.message}
            {...register(`parts.${i}.description`)}
          />
          <TextField
            label="Quantity"
            {...decimal}
            error={errors.parts?.[i]?.quantity?.message}
            {...register(`parts.${i}.quantity`, requiredNumber)}
          />
          {showCosts ? (
            <MoneyField
              label="Unit cost"
              control={control}
              name={`parts.${i}.unitCostMinor`}
              currency={currency}
              error={errors.parts?.[i]?.unitCostMinor?.message}
            />
          ) : null}
        </LineRow>
      ))}
    </LineList>
  );
}

/** Fluids used: kind, volume and unit from the tasks, with a cost per unit of volume. */
export function FluidsFields({
  form,
  rows,
  showCosts,
  currency,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'fluids'>;
  showCosts: boolean;
  currency: string;
}) {
  const {
    control,
    register,
    formState: { errors },
  } = form;
  return (
    <LineList
      legend="Fluids"
      hint={
        showCosts ? 'The unit cost of a fluid is per unit of volume (per L, per gal).' : undefined
      }
      emptyText="No fluids."
      addLabel="Add fluid"
      onAdd={() => rows.append({ kind: '', volume: 1, unit: 'L', unitCostMinor: null })}
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => (
        <LineRow
          key={row.id}
          label={`Fluid ${i + 1}`}
          columns={
            showCosts
              ? 'sm:grid-cols-[1fr_6rem_5.5rem_7rem_auto]'
              : 'sm:grid-cols-[1fr_6rem_5.5rem_auto]'
          }
          onRemove={() => rows.remove(i)}
        >
          <TextField
            label="Fluid kind"
            autoComplete="off"
            error={errors.fluids?.[i]?.kind?.message}
            {...register(`fluids.${i}.kind`)}
          />
          <TextField
            label="Volume"
            {...decimal}
            error={errors.fluids?.[i]?.volume?.message}
            {...register(`fluids.${i}.volume`, requiredNumber)}
          />
          <SelectField
            label="Unit"
            options={FLUID_UNIT_OPTIONS}
            error={errors.fluids?.[i]?.unit?.message}
            {...register(`fluids.${i}.unit`)}
          />
          {showCosts ? (
            <MoneyField
              label="Unit cost"
              control={control}
              name={`fluids.${i}.unitCostMinor`}
              currency={currency}
              error={errors.fluids?.[i]?.unitCostMinor?.message}
            />
          ) : null}
        </LineRow>
      ))}
    </LineList>
  );
}
