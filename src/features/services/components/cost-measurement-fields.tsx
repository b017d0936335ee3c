import { useWatch, type UseFieldArrayReturn } from 'react-hook-form';
import { specRangeWords, testConditionsWords } from '../../../../shared/domain/measurement-spec';
import type { SpecSheet } from '../../../../shared/schemas/spec-sheet';
import { Button } from '../../../components/ui/button';
import { Caution } from '../../../components/ui/caution';
import { TextField } from '../../../components/ui/field';
import { MoneyField } from '../../../components/ui/money-field';
import {
  optionalNumber,
  requiredNumber,
  type ServiceForm,
  type ServiceFormInput,
} from '../lib/form-values';
import { LineList, LineRow } from './line-rows';

const decimal = { type: 'number', inputMode: 'decimal', step: 'any' } as const;

/** Costs that are not parts or fluids: outside work, consumables, a call-out. */
export function OtherCostsFields({
  form,
  rows,
  currency,
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'otherCosts'>;
  /** the farm's currency: amounts are typed in it */
  currency: string;
}) {
  const {
    control,
    register,
    formState: { errors },
  } = form;
  return (
    <LineList
      legend="Other costs"
      emptyText="No other costs."
      addLabel="Add cost"
      onAdd={() => rows.append({ description: '', amountMinor: 0 })}
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => (
        <LineRow
          key={row.id}
          label={`Cost ${i + 1}`}
          columns="sm:grid-cols-[1fr_8rem_auto]"
          onRemove={() => rows.remove(i)}
        >
          <TextField
            label="Cost description"
            autoComplete="off"
            error={errors.otherCosts?.[i]?.description?.message}
            {...register(`otherCosts.${i}.description`)}
          />
          <MoneyField
            label="Amount"
            control={control}
            name={`otherCosts.${i}.amountMinor`}
            currency={currency}
            required
            error={errors.otherCosts?.[i]?.amountMinor?.message}
          />
        </LineRow>
      ))}
    </LineList>
  );
}

/** The test pressures of the machine's spec sheet (a measurement of the same name takes its spec). */
export type SheetTest = SpecSheet['testPressures'][number];

const sheetTestFor = (tests: readonly SheetTest[], name: string | undefined) =>
  tests.find((t) => t.name.trim().toLowerCase() === (name ?? '').trim().toLowerCase()) ?? null;

/** "Spec sheet: 2,000–2,200 kPa at 2,100 rpm, oil 50 °C" under a measurement of a sheet test. */
function SheetSpecHint({ test }: { test: SheetTest }) {
  const conditions = testConditionsWords(test);
  return (
    <div className="flex flex-col gap-1">
      <p className="text-sm text-field-700">
        <span className="font-bold">Spec sheet:</span>{' '}
        {specRangeWords(test.min, test.max, test.unit)}
        {conditions ? ` ${conditions}` : ' (no test conditions on the sheet)'}. Measure at these
        conditions, or note how they differed.
      </p>
      <Caution variant="line" heading="Caution." hazards={['hydraulic_pressure']} defer />
    </div>
  );
}

/**
 * Readings taken during the visit, with the spec they are held to; the server judges in or out.
 * A test of the machine's spec sheet is added with its spec in one tap, and a row named like one
 * takes its spec and unit when they are blank; the sheet's test conditions show beside it.
 */
export function MeasurementsFields({
  form,
  rows,
  sheetTests = [],
}: {
  form: ServiceForm;
  rows: UseFieldArrayReturn<ServiceFormInput, 'measurements'>;
  sheetTests?: readonly SheetTest[];
}) {
  const {
    control,
    register,
    getValues,
    setValue,
    formState: { errors },
  } = form;
  const names = useWatch({ control, name: 'measurements' })?.map((m) => m?.name) ?? [];
  const fillFromSheet = (i: number) => {
    const test = sheetTestFor(sheetTests, getValues(`measurements.${i}.name`));
    const row = getValues(`measurements.${i}`);
    if (!test || !row) return;
    if (row.specMin == null && row.specMax == null) {
      setValue(`measurements.${i}.specMin`, test.min);
      setValue(`measurements.${i}.specMax`, test.max);
    }
    if (!row.unit) setValue(`measurements.${i}.unit`, test.unit);
  };
  const unused = sheetTests.filter((t) => !names.some((n) => sheetTestFor([t], n)));
  return (
    <LineList
      legend="Measurements"
      hint={
        <>
          A pressure, a clearance, a voltage taken during the visit, with the manual&apos;s limits
          if it gives them. The record shows each as in spec, low or high, and the machine&apos;s
          page charts it over the visits.
          {unused.length ? (
            <span className="mt-2 flex flex-wrap gap-2">
              {unused.map((t) => (
                <Button
                  key={t.name}
                  variant="secondary"
                  icon="plus"
                  onClick={() =>
                    rows.append({
                      name: t.name,
                      value: undefined as unknown as number,
                      unit: t.unit,
                      specMin: t.min,
                      specMax: t.max,
                    })
                  }
                >
                  {t.name} (spec sheet)
                </Button>
              ))}
            </span>
          ) : null}
        </>
      }
      emptyText="No measurements."
      addLabel="Add measurement"
      onAdd={() =>
        rows.append({
          name: '',
          value: undefined as unknown as number,
          unit: '',
          specMin: null,
          specMax: null,
        })
      }
      count={rows.fields.length}
    >
      {rows.fields.map((row, i) => {
        const test = sheetTestFor(sheetTests, names[i]);
        return (
          <LineRow
            key={row.id}
            label={`Measurement ${i + 1}`}
            columns="sm:grid-cols-[1fr_6rem_5rem_6rem_6rem_auto]"
            onRemove={() => rows.remove(i)}
            footer={test ? <SheetSpecHint test={test} /> : undefined}
          >
            <TextField
              label="Measurement name"
              autoComplete="off"
              placeholder="PTO clutch pressure"
              error={errors.measurements?.[i]?.name?.message}
              {...register(`measurements.${i}.name`, { onBlur: () => fillFromSheet(i) })}
            />
            <TextField
              label="Value"
              {...decimal}
              error={errors.measurements?.[i]?.value?.message}
              {...register(`measurements.${i}.value`, requiredNumber)}
            />
            <TextField
              label="Unit"
              autoComplete="off"
              placeholder="psi"
              error={errors.measurements?.[i]?.unit?.message}
              {...register(`measurements.${i}.unit`)}
            />
            <TextField
              label="Spec min"
              {...decimal}
              error={errors.measurements?.[i]?.specMin?.message}
              {...register(`measurements.${i}.specMin`, optionalNumber)}
            />
            <TextField
              label="Spec max"
              {...decimal}
              error={errors.measurements?.[i]?.specMax?.message}
              {...register(`measurements.${i}.specMax`, optionalNumber)}
            />
          </LineRow>
        );
      })}
    </LineList>
  );
}
