import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { plannedUse } from '../../../../shared/domain/season-use';
import {
  seasonPlanInputSchema,
  type SeasonPlanInput,
} from '../../../../shared/schemas/season-hours';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ChoiceChips } from '../../../components/ui/choice-chips';
import { SelectField, TextField } from '../../../components/ui/field';
import { useCurrentMembership } from '../../../lib/auth';
import { formatMeter, meterUnitLabel } from '../../../lib/fleet-format';
import { applyServerErrors } from '../../../lib/form-errors';
import { meterValueAs, withMeterReasons } from '../../../lib/meter-input';
import type { SeasonHoursRow } from '../api/get-season-hours';
import { useChangeSeasonPlan } from '../api/set-season-plan';
import { planStartNote } from '../lib/plan-start';

type Mode = 'value' | 'area';
const MODES: { value: Mode; label: string }[] = [
  { value: 'value', label: 'Planned use' },
  { value: 'area', label: 'Area and work rate' },
];
const AREA_UNITS = [
  { value: 'ha', label: 'hectares (ha)' },
  { value: 'ac', label: 'acres (ac)' },
];
const FIELDS = ['value', 'area', 'areaUnit', 'areaPerHour'] as const;

/**
 * A manager's plan for one machine's season: its use in the meter's unit, or the area it will
 * work at a rate (hours = area ÷ rate, worked out by shared/domain as the server does). Says when
 * the plan starts to count when that is later than today (`asOf`, the farm's local date).
 */
export function SeasonPlanForm({
  orgId,
  row,
  year,
  asOf,
  onDone,
}: {
  orgId: string;
  row: SeasonHoursRow;
  year: number;
  asOf: string;
  onDone: () => void;
}) {
  const { units } = useCurrentMembership().membership.organization;
  const change = useChangeSeasonPlan(orgId);
  const plan = row.plan;
  const [mode, setMode] = useState<Mode>(plan && plan.area !== null ? 'area' : 'value');
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<SeasonPlanInput>({
    // only the chosen way's fields are registered, so only they are checked and sent
    shouldUnregister: true,
    resolver: withMeterReasons(zodResolver(seasonPlanInputSchema)),
    defaultValues: {
      value: plan?.value ?? undefined,
      area: plan?.area ?? undefined,
      areaUnit: plan?.areaUnit ?? (units === 'imperial' ? 'ac' : 'ha'),
      areaPerHour: plan?.areaPerHour ?? undefined,
    },
  });
  const watched = useWatch({ control });
  const worked =
    mode === 'area'
      ? plannedUse(
          {
            meterId: '',
            unit: row.unit,
            area: numberOrNull(watched.area),
            areaUnit: watched.areaUnit ?? null,
            areaPerHour: numberOrNull(watched.areaPerHour),
          },
          row.unit,
        )
      : null;

  const submit = handleSubmit(async (input) => {
    setFormError(null);
    try {
      await change.mutateAsync({ kind: 'set', machineId: row.machine.id, year, input });
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, FIELDS));
    }
  });

  const unitLabel = meterUnitLabel(row.unit);
  const startNote = planStartNote(year, row.seasonMonths, asOf);
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Plan the ${year} season of ${row.machine.fleetNumber}`}
      className="flex flex-col gap-4 rounded-lg border border-field-200 bg-oat-50 p-3"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      {startNote ? <p className="text-field-800">{startNote}</p> : null}
      <ChoiceChips legend="Plan by" options={MODES} value={mode} onChange={setMode} />
      {mode === 'value' ? (
        <TextField
          label={`Planned use (${unitLabel})`}
          hint={`The season's use on its meter, in ${unitLabel}.`}
          inputMode="decimal"
          autoComplete="off"
          error={errors.value?.message}
          {...register('value', meterValueAs(units))}
        />
      ) : (
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label="Planned area"
            inputMode="decimal"
            autoComplete="off"
            error={errors.area?.message}
            {...register('area', meterValueAs(units))}
          />
          <SelectField
            label="Area unit"
            options={AREA_UNITS}
            error={errors.areaUnit?.message}
            {...register('areaUnit')}
          />
          <TextField
            label="Work rate (area per hour)"
            inputMode="decimal"
            autoComplete="off"
            error={errors.areaPerHour?.message}
            {...register('areaPerHour', meterValueAs(units))}
          />
        </div>
      )}
      {mode === 'area' ? (
        <p className="text-field-700" aria-live="polite">
          {worked !== null
            ? `Worked out: ${formatMeter(Math.round(worked * 10) / 10, row.unit)} for the season.`
            : (numberOrNull(watched.area) ?? 0) > 0 && (numberOrNull(watched.areaPerHour) ?? 0) > 0
              ? `An area cannot be said in ${unitLabel}: plan the use in ${unitLabel} instead.`
              : `Enter the area and the work rate to see the ${unitLabel} it comes to.`}
        </p>
      ) : null}
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" pending={isSubmitting}>
          Save plan
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

const numberOrNull = (value: unknown): number | null =>
  typeof value === 'number' && Number.isFinite(value) ? value : null;
