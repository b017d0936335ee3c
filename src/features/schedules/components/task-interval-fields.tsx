import { TextField } from '../../../components/ui/field';
import { optionalNumber, type TaskFormApi } from '../lib/task-form-values';
import { TaskSeasonFields } from './task-season-fields';

/** The task's intervals, season service, first service, warning window and labour. */
export function TaskIntervalFields({
  form,
  unitWord,
}: {
  form: TaskFormApi;
  /** the meter unit spelled out ("hours") */
  unitWord: string;
}) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 font-black text-field-900">Interval</legend>
      <p className="-mt-1 text-sm text-field-600">
        Take the figures from this machine's operator's manual. Give a meter interval, a day
        interval or both (whichever comes first) — or make it a season service, with or without a
        meter interval.
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
      <TaskSeasonFields form={form} />
    </fieldset>
  );
}
