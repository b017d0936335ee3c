import { Controller, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import type { checklistTemplateCreateSchema } from '../../../../shared/schemas/walkarounds';
import { Badge } from '../../../components/ui/badge';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { TextareaField } from '../../../components/ui/textarea-field';
import { HAZARD_OPTIONS } from '../lib/hazards';
import type { MachineClass } from '../../../../shared/domain/service-library/classes';
import { ItemScopeFields } from './item-scope-fields';

export type ChecklistFormValues = z.input<typeof checklistTemplateCreateSchema>;

interface ChecklistItemFieldsProps {
  index: number;
  count: number;
  label: string;
  critical: boolean;
  hazardCount: number;
  /** checked from the seat with the engine running (else walking round before start) */
  running: boolean;
  /** the classes it is kept for (none: every machine of the category) */
  classCount: number;
  classOptions: readonly { value: MachineClass; label: string }[];
  open: boolean;
  control: Control<ChecklistFormValues, unknown, z.output<typeof checklistTemplateCreateSchema>>;
  register: UseFormRegister<ChecklistFormValues>;
  errors: FieldErrors<ChecklistFormValues>;
  onToggle: () => void;
  onMove: (to: number) => void;
  onRemove: () => void;
}

const iconButton =
  'inline-flex size-12 items-center justify-center rounded-lg text-field-700 hover:bg-field-100 disabled:opacity-40';

/** One item of the checklist being edited: a summary line, and its fields when opened. */
export function ChecklistItemFields({
  index,
  count,
  label,
  critical,
  hazardCount,
  running,
  classCount,
  classOptions,
  open,
  control,
  register,
  errors,
  onToggle,
  onMove,
  onRemove,
}: ChecklistItemFieldsProps) {
  const itemErrors = errors.items?.[index];
  const name = label.trim() || `Item ${index + 1}`;
  return (
    <fieldset className="rounded-xl border border-field-200 bg-white p-3">
      <legend className="sr-only">Item {index + 1}</legend>
      <div className="flex items-center gap-1">
        <button
          type="button"
          aria-expanded={open}
          onClick={onToggle}
          className="flex min-h-12 min-w-0 flex-1 flex-wrap items-center gap-2 rounded-lg px-2 text-left hover:bg-field-50"
        >
          <span className="font-bold text-field-500">{index + 1}.</span>
          <span className="min-w-0 font-bold text-field-950">{name}</span>
          {critical ? (
            <Badge tone="overdue" icon="lock">
              Critical
            </Badge>
          ) : null}
          {hazardCount > 0 ? (
            <Badge tone="due-soon" icon="alert">
              Caution
            </Badge>
          ) : null}
          {running ? (
            <Badge tone="info" icon="gauge">
              In the seat
            </Badge>
          ) : null}
          {classCount > 0 ? <Badge tone="accent">Some classes only</Badge> : null}
          {itemErrors ? (
            <Badge tone="overdue" icon="error">
              Check this item
            </Badge>
          ) : null}
          <span className="sr-only">{open ? ', close' : ', edit'}</span>
        </button>
        <button
          type="button"
          className={iconButton}
          disabled={index === 0}
          onClick={() => onMove(index - 1)}
        >
          <Icon name="back" className="size-5 rotate-90" />
          <span className="sr-only">Move {name} up</span>
        </button>
        <button
          type="button"
          className={iconButton}
          disabled={index === count - 1}
          onClick={() => onMove(index + 1)}
        >
          <Icon name="back" className="size-5 -rotate-90" />
          <span className="sr-only">Move {name} down</span>
        </button>
        <button type="button" className={iconButton} disabled={count === 1} onClick={onRemove}>
          <Icon name="trash" className="size-5" />
          <span className="sr-only">Remove {name}</span>
        </button>
      </div>
      {open ? (
        <div className="mt-3 flex flex-col gap-4 border-t border-field-100 pt-3">
          <TextField
            label="What to check"
            error={itemErrors?.label?.message}
            {...register(`items.${index}.label`)}
          />
          <TextareaField
            label="Guidance"
            hint="What good looks like, in a line or two."
            error={itemErrors?.guidance?.message}
            {...register(`items.${index}.guidance`)}
          />
          <label className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-field-200 px-3 py-2 has-[:checked]:border-poppy-600 has-[:checked]:bg-poppy-50">
            <input
              type="checkbox"
              className="size-5 accent-poppy-700"
              {...register(`items.${index}.critical`)}
            />
            <span>
              <span className="font-bold">Critical</span> — a fail tags the machine out until a
              technician or manager clears it
            </span>
          </label>
          <ItemScopeFields
            index={index}
            control={control}
            register={register}
            classOptions={classOptions}
            phaseError={itemErrors?.phase?.message}
          />
          <Controller
            control={control}
            name={`items.${index}.hazards`}
            render={({ field, fieldState }) => (
              <CheckboxGroup
                legend="Hazards"
                hint="Ticked hazards show a caution beside the item."
                options={HAZARD_OPTIONS}
                value={field.value ?? []}
                onChange={field.onChange}
                error={fieldState.error?.message}
              />
            )}
          />
          <TextareaField
            label="Caution"
            hint="Empty: the standard caution of the ticked hazards (empty it after changing them). Your own wording should end by deferring to the operator's manual and local rules."
            error={itemErrors?.caution?.message}
            {...register(`items.${index}.caution`)}
          />
        </div>
      ) : null}
    </fieldset>
  );
}
