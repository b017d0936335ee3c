import { useFieldArray } from 'react-hook-form';
import { FLUID_UNITS } from '../../../../shared/schemas/schedule';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { requiredNumber, type TaskFormApi } from '../lib/task-form-values';

// The task's parts and fluids: rows added and removed, each a group named by its number.

const UNIT_OPTIONS = FLUID_UNITS.map((value) => ({ value, label: value }));

/** The parts a task takes: part number, description, quantity, whether it is a wear part. */
export function TaskPartsFields({ form }: { form: TaskFormApi }) {
  const {
    register,
    control,
    formState: { errors },
  } = form;
  const parts = useFieldArray({ control, name: 'parts' });
  return (
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
          {row.filterRole ? (
            <p className="text-sm text-field-600 sm:col-span-full">
              The part number comes from the machine&apos;s spec sheet: saving the sheet sets it
              again.
            </p>
          ) : null}
          <label className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-field-200 px-3 py-2 sm:col-span-3 has-[:checked]:border-field-600 has-[:checked]:bg-field-50">
            <input type="checkbox" className="size-5" {...register(`parts.${index}.wearPart`)} />
            <span>
              <span className="font-bold">Wear part</span> — inspected at each service and replaced
              only when worn, so never counted as used (no part number needed)
            </span>
          </label>
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
          onClick={() =>
            parts.append({ partNumber: '', description: '', quantity: 1, wearPart: false })
          }
        >
          Add part
        </Button>
      </div>
    </fieldset>
  );
}

/** The fluids a task takes: kind, volume, unit. */
export function TaskFluidsFields({ form }: { form: TaskFormApi }) {
  const {
    register,
    control,
    formState: { errors },
  } = form;
  const fluids = useFieldArray({ control, name: 'fluids' });
  return (
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
          {row.capacity ? (
            <p className="text-sm text-field-600 sm:col-span-full">
              Volume, unit and fluid come from the machine&apos;s spec sheet: saving the sheet sets
              them again.
            </p>
          ) : null}
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
  );
}
