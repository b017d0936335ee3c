import { Controller } from 'react-hook-form';
import type { UnitSystem } from '../../../../shared/constants';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { TextField } from '../../../components/ui/field';
import { formatDateTime, roleLabel } from '../../../lib/format';
import { formatMeter, meterUnitLabel } from '../../../lib/fleet-format';
import { meterValueAs } from '../../../lib/meter-input';
import type { ShopPerson } from '../api/types';
import { optionalNumber, type ServiceForm, type ServiceFormMode } from '../lib/form-values';
import { formatHours } from '../lib/record-format';

/** When (done or booked), the meter at service, labour and who did it. */
export function VisitFields({
  form,
  mode,
  machine,
  people,
  estimate,
  today,
  timeZone,
  units,
}: {
  form: ServiceForm;
  mode: ServiceFormMode;
  machine: { meterUnit: string; lastReading: { value: number; takenAt: string } | null };
  people: readonly ShopPerson[];
  /** the server's estimate from the chosen tasks, hours */
  estimate: number;
  today: string;
  timeZone: string;
  /** the farm's units: how a typed comma in the meter is read */
  units: UnitSystem;
}) {
  const {
    register,
    control,
    formState: { errors },
  } = form;
  const unit = machine.meterUnit;
  const last = machine.lastReading;
  const estimateText =
    estimate > 0 ? `The chosen tasks take about ${formatHours(estimate)}.` : undefined;

  return (
    <div className="flex flex-col gap-5">
      {mode === 'plan' ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField
            label="Planned for"
            type="date"
            error={errors.plannedFor?.message}
            {...register('plannedFor')}
          />
          {estimateText ? (
            <p className="self-end pb-2 font-bold text-field-800">{estimateText}</p>
          ) : null}
        </div>
      ) : (
        <div className="grid gap-4 sm:grid-cols-3">
          <TextField
            label="Date performed"
            hint="The day the work was done."
            type="date"
            max={today}
            error={errors.performedOn?.message}
            {...register('performedOn')}
          />
          <TextField
            label="Meter at service"
            hint={
              last
                ? `In ${meterUnitLabel(unit)}, as the meter reads. Last reading ${formatMeter(last.value, unit)}, ${formatDateTime(last.takenAt, timeZone)}.`
                : `In ${meterUnitLabel(unit)}, as the meter reads.`
            }
            type="text"
            inputMode="decimal"
            autoComplete="off"
            error={errors.meterValue?.message}
            {...register('meterValue', meterValueAs(units))}
          />
          <TextField
            label="Labour hours"
            hint={estimateText ?? 'Hours of work on this visit.'}
            type="number"
            inputMode="decimal"
            step="any"
            min={0}
            error={errors.labourHours?.message}
            {...register('labourHours', optionalNumber)}
          />
        </div>
      )}
      {/* no one to name (a dealer's advisor records as themselves) */}
      {people.length === 0 ? null : (
        <Controller
          control={control}
          name="technicianIds"
          render={({ field, fieldState }) => (
            <CheckboxGroup
              legend="Technicians"
              hint={
                mode === 'plan'
                  ? 'Who is booked for the visit.'
                  : 'Who did the work. Nobody ticked: you are recorded.'
              }
              options={people.map((p) => ({
                value: p.userId,
                label: `${p.name} (${roleLabel(p.role)})`,
              }))}
              value={field.value ?? []}
              onChange={field.onChange}
              error={fieldState.error?.message}
              columns={3}
            />
          )}
        />
      )}
    </div>
  );
}
