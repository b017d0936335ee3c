import { Controller, type Control, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import {
  CHECKLIST_PHASES,
  CHECKLIST_PHASE_LABELS,
  type checklistTemplateCreateSchema,
} from '../../../../shared/schemas/walkarounds';
import type { MachineClass } from '../../../../shared/domain/service-library/classes';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';

type FormValues = z.input<typeof checklistTemplateCreateSchema>;

/**
 * When an item is checked (walking round before start, or from the seat with the engine
 * running) and which machines of the category it is for (every one, or only those of some
 * classes of the service library).
 */
export function ItemScopeFields({
  index,
  control,
  register,
  classOptions,
  phaseError,
}: {
  index: number;
  control: Control<FormValues, unknown, z.output<typeof checklistTemplateCreateSchema>>;
  register: UseFormRegister<FormValues>;
  classOptions: readonly { value: MachineClass; label: string }[];
  phaseError?: string;
}) {
  return (
    <>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold text-field-900">When it is checked</legend>
        {CHECKLIST_PHASES.map((phase) => (
          <label
            key={phase}
            className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-field-200 px-3 py-2 has-[:checked]:border-field-700 has-[:checked]:bg-field-50"
          >
            <input
              type="radio"
              value={phase}
              className="size-5 accent-field-800"
              {...register(`items.${index}.phase`)}
            />
            <span>{CHECKLIST_PHASE_LABELS[phase]}</span>
          </label>
        ))}
        {phaseError ? <p className="text-sm font-bold text-poppy-800">{phaseError}</p> : null}
      </fieldset>
      {classOptions.length ? (
        <Controller
          control={control}
          name={`items.${index}.classes`}
          render={({ field, fieldState }) => (
            <CheckboxGroup
              legend="Only on machines of class"
              hint="None ticked: every machine of this category. Ticked: only machines given one of these classes (a loader's pins on a loader tractor, say)."
              options={classOptions}
              value={field.value ?? []}
              onChange={field.onChange}
              columns={2}
              error={fieldState.error?.message}
            />
          )}
        />
      ) : null}
    </>
  );
}
