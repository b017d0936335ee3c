import { SelectField, TextField } from '../../../components/ui/field';
import { optionalNumber, type TaskFormApi } from '../lib/task-form-values';

// The season service choice of the task form: none, before the machine's season starts (a
// pre-season service) or after it ends (storage), with the days. The date then follows the
// machine's season months, so a day interval is left empty (the schema says so if it is not).

const SEASON_OPTIONS = [
  { value: '', label: 'None' },
  { value: 'before_start', label: 'Before the season starts' },
  { value: 'after_end', label: 'After the season ends' },
] as const;

/** An empty choice is "no season service" (null), as the API takes it. */
const optionalChoice = { setValueAs: (v: unknown) => (v === '' || v == null ? null : v) };

export function TaskSeasonFields({
  form: {
    register,
    formState: { errors },
  },
}: {
  form: TaskFormApi;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <SelectField
        label="Season service"
        hint="Due days before this machine's season starts or after it ends (its season months)."
        options={SEASON_OPTIONS}
        error={errors.seasonAnchor?.message}
        {...register('seasonAnchor', optionalChoice)}
      />
      <TextField
        label="Season days"
        hint="Days before the start or after the end (0–120)"
        type="number"
        inputMode="numeric"
        min={0}
        max={120}
        error={errors.seasonOffsetDays?.message}
        {...register('seasonOffsetDays', optionalNumber)}
      />
    </div>
  );
}
