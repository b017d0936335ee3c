import { useState } from 'react';
import { Controller, useForm, type Path, type UseFormSetError } from 'react-hook-form';
import type { ZodError } from 'zod';
import { UNIT_SYSTEMS, type OrganizationKind } from '../../../../shared/constants';
import {
  organizationCreateSchema,
  organizationUpdateSchema,
  type OrganizationCreateInput,
  type OrganizationSettings,
  type OrganizationUpdateInput,
} from '../../../../shared/schemas/organizations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxGroup } from '../../../components/ui/checkbox-group';
import { SelectField, TextField } from '../../../components/ui/field';
import { changedFields } from '../../../lib/changed-fields';
import { applyServerErrors } from '../../../lib/form-errors';
import {
  HOUR_OPTIONS,
  MONTH_OPTIONS,
  currencyOptions,
  rateToText,
  textToRate,
  timeZoneOptions,
} from '../lib/organization-options';

export interface OrganizationFormValues {
  kind: OrganizationKind;
  name: string;
  timeZone: string;
  currency: string;
  units: (typeof UNIT_SYSTEMS)[number];
  /** in the currency's major units, as typed */
  labourRate: string;
  seasonMonths: number[];
  digestHour: string;
}

const FIELDS: Path<OrganizationFormValues>[] = [
  'kind',
  'name',
  'timeZone',
  'currency',
  'units',
  'labourRate',
  'seasonMonths',
  'digestHour',
];
const UNIT_OPTIONS = [
  { value: 'metric', label: 'Metric (litres, km, ha)' },
  { value: 'imperial', label: 'Imperial (gallons, miles, acres)' },
];

/** API field → form field (the rate is typed in major units). */
const formFieldOf = (field: string) =>
  (field === 'labourRateMinor'
    ? 'labourRate'
    : field.split('.')[0]) as Path<OrganizationFormValues>;

export const formValuesOf = (o: OrganizationSettings): OrganizationFormValues => ({
  kind: o.kind,
  name: o.name,
  timeZone: o.timeZone,
  currency: o.currency,
  units: o.units,
  labourRate: rateToText(o.labourRateMinor, o.currency),
  seasonMonths: o.seasonMonths,
  digestHour: String(o.digestHour),
});

function toApi(v: OrganizationFormValues) {
  return {
    kind: v.kind,
    name: v.name,
    timeZone: v.timeZone,
    currency: v.currency,
    units: v.units,
    labourRateMinor: textToRate(v.labourRate, v.currency),
    seasonMonths: v.seasonMonths,
    digestHour: Number(v.digestHour),
  };
}

function showIssues(error: ZodError, setError: UseFormSetError<OrganizationFormValues>) {
  for (const issue of error.issues) {
    setError(formFieldOf(String(issue.path[0] ?? 'name')), { type: 'zod', message: issue.message });
  }
}

interface OrganizationFormProps {
  mode: 'create' | 'edit';
  initial: OrganizationFormValues;
  submitLabel: string;
  onCreate?: (input: OrganizationCreateInput) => Promise<unknown>;
  onUpdate?: (input: OrganizationUpdateInput) => Promise<unknown>;
  /** read only for those who may not change the settings */
  readOnly?: boolean;
}

/**
 * A farm's or a dealer's settings. Validated with the server's own schemas before sending; an
 * edit sends only the fields changed.
 */
export function OrganizationForm(props: OrganizationFormProps) {
  const { mode, initial, submitLabel, readOnly = false } = props;
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  // what the server holds now: an edit sends only what differs from it
  const [baseline, setBaseline] = useState(initial);
  const {
    register,
    control,
    handleSubmit,
    setError,
    watch,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<OrganizationFormValues>({ defaultValues: initial });
  const kind = watch('kind');
  const currency = watch('currency');

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    try {
      if (mode === 'create') {
        const { digestHour: _hour, ...fields } = toApi(values);
        const body =
          fields.kind === 'farm'
            ? fields
            : {
                kind: fields.kind,
                name: fields.name,
                timeZone: fields.timeZone,
                currency: fields.currency,
                units: fields.units,
              };
        const parsed = organizationCreateSchema.safeParse(body);
        if (!parsed.success) return showIssues(parsed.error, setError);
        await props.onCreate?.(parsed.data);
      } else {
        const { kind: _kind, ...before } = toApi(baseline);
        const { kind: _same, ...after } = toApi(values);
        const changed = changedFields(before, after);
        if (kind === 'dealer') {
          delete changed.labourRateMinor;
          delete changed.seasonMonths;
          delete changed.digestHour;
        }
        const parsed = organizationUpdateSchema.safeParse(changed);
        if (!parsed.success) return showIssues(parsed.error, setError);
        await props.onUpdate?.(parsed.data);
        reset(values);
        setBaseline(values);
        setSaved(true);
      }
    } catch (error) {
      const unplaced = applyServerErrors(error, setError, FIELDS);
      setFormError(unplaced);
    }
  });

  const isFarm = kind === 'farm';
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      {saved ? <Alert tone="success">Settings saved.</Alert> : null}
      <fieldset disabled={readOnly} className="flex flex-col gap-5">
        {mode === 'create' ? (
          <SelectField
            label="Kind"
            hint="A farm keeps its machines here; a dealer follows the machines of the farms that link to it."
            options={[
              { value: 'farm', label: 'Farm' },
              { value: 'dealer', label: 'Dealer' },
            ]}
            error={errors.kind?.message}
            {...register('kind')}
          />
        ) : null}
        <TextField label="Name" error={errors.name?.message} {...register('name')} />
        <div className="grid gap-5 sm:grid-cols-2">
          <SelectField
            label="Time zone"
            hint="Due dates, digests and the day's readings follow it."
            options={timeZoneOptions(initial.timeZone)}
            error={errors.timeZone?.message}
            {...register('timeZone')}
          />
          <SelectField
            label="Currency"
            options={currencyOptions(initial.currency)}
            error={errors.currency?.message}
            {...register('currency')}
          />
        </div>
        {isFarm ? null : (
          <SelectField
            label="Units"
            hint="The parts forecast sums fluids in them: litres and kilograms, or US gallons and pounds."
            options={UNIT_OPTIONS}
            error={errors.units?.message}
            {...register('units')}
          />
        )}
        {isFarm ? (
          <>
            <div className="grid gap-5 sm:grid-cols-2">
              <SelectField
                label="Units"
                options={UNIT_OPTIONS}
                error={errors.units?.message}
                {...register('units')}
              />
              <TextField
                label={`Labour rate per hour (${currency})`}
                inputMode="decimal"
                hint="What an hour of shop work costs; used for the cost of services."
                error={errors.labourRate?.message}
                {...register('labourRate')}
              />
            </div>
            <Controller
              control={control}
              name="seasonMonths"
              render={({ field }) => (
                <CheckboxGroup
                  legend="Usual season"
                  hint="The months the farm's machines usually work. Leave all clear for all year."
                  options={MONTH_OPTIONS}
                  value={field.value}
                  onChange={field.onChange}
                  error={errors.seasonMonths?.message}
                  columns={4}
                />
              )}
            />
            {mode === 'edit' ? (
              <SelectField
                label="Digest hour"
                hint="The local hour the daily due digest goes out."
                options={HOUR_OPTIONS}
                error={errors.digestHour?.message}
                {...register('digestHour')}
              />
            ) : null}
          </>
        ) : null}
      </fieldset>
      {readOnly ? null : (
        <Button type="submit" pending={isSubmitting} className="w-full sm:w-auto">
          {submitLabel}
        </Button>
      )}
    </form>
  );
}
