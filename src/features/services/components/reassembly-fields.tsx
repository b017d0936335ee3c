import { useId } from 'react';
import type { UseFieldArrayReturn } from 'react-hook-form';
import { Caution } from '../../../components/ui/caution';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { TaskChoice } from '../api/types';
import type { ServiceForm, ServiceFormInput } from '../lib/form-values';
import { hazardNames } from '../../../lib/caution-text';
import { LineList, LineRow } from './line-rows';

/**
 * What was counted, removed or set on the way apart and must go back the same, each with its
 * "Restored" tick. The server refuses completion while one is unticked without a reason; its
 * message lands beside that setting's tick, and the reason field opens.
 */
export function ReassemblyFields({
  form,
  rows,
  tasks,
  showReason,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'reassemblySettings'>;
  tasks: readonly TaskChoice[];
  showReason: boolean;
}) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <div className="flex flex-col gap-3">
      <LineList
        legend="Reassembly settings"
        hint={
          <>
            <p>
              Write down what must go back the same on reassembly: adjuster turns counted out (per
              side), shim pack thickness and position, a torque applied. Tick{' '}
              <strong>Restored</strong> once each one is back as it was.
            </p>
            <p className="mt-1">
              The service can't be completed while a setting is unticked, unless you give the
              reason.
            </p>
          </>
        }
        emptyText="No settings recorded."
        addLabel="Add setting"
        onAdd={() => rows.append({ what: '', value: '', restored: false })}
        count={rows.fields.length}
      >
        {rows.fields.length > 0 ? <ReassemblyCaution tasks={tasks} /> : null}
        {rows.fields.map((row, i) => (
          <SettingRow key={row.id} index={i} form={form} onRemove={() => rows.remove(i)} />
        ))}
      </LineList>

      {showReason ? (
        <TextareaField
          label="Reason a setting is not restored"
          hint="Only when a setting stays as it is on purpose: say why, and the service can be completed."
          rows={2}
          error={errors.unrestoredReason?.message}
          {...register('unrestoredReason')}
        />
      ) : null}
    </div>
  );
}

/** One setting: what and its value, the "Restored" tick, and the server's refusal under the line. */
function SettingRow({
  index: i,
  form,
  onRemove,
}: {
  index: number;
  form: ServiceForm;
  onRemove: () => void;
}) {
  const id = useId();
  const {
    register,
    formState: { errors },
  } = form;
  const error = errors.reassemblySettings?.[i]?.restored?.message;
  return (
    <LineRow
      label={`Setting ${i + 1}`}
      columns="sm:grid-cols-[1fr_12rem_9rem_auto]"
      onRemove={onRemove}
      footer={
        error ? (
          <p
            id={`${id}-error`}
            className="flex items-start gap-1.5 text-sm font-bold text-poppy-700"
          >
            <Icon name="error" className="mt-0.5 size-4 shrink-0" />
            <span>{error}</span>
          </p>
        ) : null
      }
    >
      <TextField
        label="What was counted, removed or set"
        autoComplete="off"
        placeholder="Left brake adjuster, turns out"
        error={errors.reassemblySettings?.[i]?.what?.message}
        {...register(`reassemblySettings.${i}.what`)}
      />
      <TextField
        label="Value"
        autoComplete="off"
        placeholder="3½ turns"
        error={errors.reassemblySettings?.[i]?.value?.message}
        {...register(`reassemblySettings.${i}.value`)}
      />
      <label
        className={`flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border bg-white px-3 font-bold text-field-900 has-[:checked]:border-clover-600 has-[:checked]:bg-clover-50 sm:mt-8 ${
          error ? 'border-2 border-poppy-600' : 'border-field-300'
        }`}
      >
        <input
          type="checkbox"
          className="size-5 accent-field-800"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          {...register(`reassemblySettings.${i}.restored`)}
        />
        Restored
      </label>
    </LineRow>
  );
}

/** The short caution of the reassembly section: stored energy, and the chosen tasks' hazards. */
function ReassemblyCaution({ tasks }: { tasks: readonly TaskChoice[] }) {
  const hazards = [...new Set(tasks.flatMap((t) => t.hazards))];
  return (
    <Caution
      variant="line"
      boxed
      heading={`Caution${hazards.length ? `: ${hazardNames(hazards)}` : ''}.`}
      text="Parts held by springs or snap rings store energy: release them with the proper tool."
      defer
    />
  );
}
