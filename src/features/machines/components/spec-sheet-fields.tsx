import type { ReactNode } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import { FLUID_SPEC_MAX, type SpecSheetUpdateInput } from '../../../../shared/schemas/spec-sheet';
import {
  CAPACITY_KEYS,
  CAPACITY_LABELS,
  CAPACITY_UNITS,
  CAPACITY_UNIT_LABELS,
  FILTER_ROLES,
  FILTER_ROLE_LABELS,
  TYRE_POSITIONS,
  TYRE_POSITION_LABELS,
  TYRE_PRESSURE_UNITS,
} from '../../../../shared/schemas/spec-keys';
import { SelectField, TextField } from '../../../components/ui/field';
import { optionalNumber, type SpecSheetFormValues } from '../lib/spec-sheet-form';

// The keyed sections of the spec sheet form: one row per compartment, filter role and tyre. A
// row left blank is not on the sheet.

export type SpecSheetFormApi = UseFormReturn<SpecSheetFormValues, unknown, SpecSheetUpdateInput>;

export const CAPACITY_UNIT_OPTIONS = CAPACITY_UNITS.map((value) => ({
  value,
  label: CAPACITY_UNIT_LABELS[value],
}));
const TYRE_UNIT_OPTIONS = TYRE_PRESSURE_UNITS.map((value) => ({ value, label: value }));
export const decimal = { type: 'number', inputMode: 'decimal', step: 'any' } as const;

/** A titled block of fields; each row inside is a group named after what it holds. */
export function SheetBlock({
  legend,
  hint,
  children,
}: {
  legend: string;
  hint?: ReactNode;
  children: ReactNode;
}) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 text-lg font-black text-field-900">{legend}</legend>
      {hint ? <p className="-mt-1 text-sm text-field-600">{hint}</p> : null}
      {children}
    </fieldset>
  );
}

export function SheetRow({
  label,
  columns,
  children,
}: {
  label: string;
  columns: string;
  children: ReactNode;
}) {
  return (
    <div
      role="group"
      aria-label={label}
      className={`grid gap-3 rounded-lg border border-field-200 bg-white p-3 sm:items-start ${columns}`}
    >
      {children}
    </div>
  );
}

export function CapacitiesFields({ form }: { form: SpecSheetFormApi }) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <SheetBlock
      legend="Capacities and fluids"
      hint="What a change takes (the manual's refill figure, with the filter), and the fluid the manual names. The schedule's oil and coolant changes take their quantities from here."
    >
      {CAPACITY_KEYS.map((k) => {
        const e = errors.capacities?.[k];
        return (
          <SheetRow key={k} label={CAPACITY_LABELS[k]} columns="sm:grid-cols-[10rem_7rem_7rem_1fr]">
            <p className="font-bold text-field-900 sm:mt-8">{CAPACITY_LABELS[k]}</p>
            <TextField
              label="Quantity"
              {...decimal}
              min={0}
              error={e?.quantity?.message}
              {...register(`capacities.${k}.quantity`, optionalNumber)}
            />
            <SelectField
              label="Unit"
              options={CAPACITY_UNIT_OPTIONS}
              error={e?.unit?.message}
              {...register(`capacities.${k}.unit`)}
            />
            <TextField
              label="Fluid specification"
              autoComplete="off"
              maxLength={FLUID_SPEC_MAX}
              placeholder={k === 'engineOil' ? 'SAE 15W-40, API CK-4' : undefined}
              error={e?.spec?.message}
              {...register(`capacities.${k}.spec`)}
            />
          </SheetRow>
        );
      })}
    </SheetBlock>
  );
}

export function FiltersFields({ form }: { form: SpecSheetFormApi }) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <SheetBlock
      legend="Filters and part numbers"
      hint="As the farm or its dealer orders them. The schedule's filter changes take these numbers."
    >
      <div className="grid gap-3 sm:grid-cols-2">
        {FILTER_ROLES.map((r) => (
          <TextField
            key={r}
            label={FILTER_ROLE_LABELS[r]}
            autoComplete="off"
            spellCheck={false}
            error={errors.filters?.[r]?.message}
            {...register(`filters.${r}`)}
          />
        ))}
      </div>
    </SheetBlock>
  );
}

export function TyreFields({ form }: { form: SpecSheetFormApi }) {
  const {
    register,
    formState: { errors },
  } = form;
  return (
    <SheetBlock legend="Tyre pressures">
      {TYRE_POSITIONS.map((p) => {
        const e = errors.tyrePressures?.[p];
        const label = `${TYRE_POSITION_LABELS[p]} tyres`;
        return (
          <SheetRow key={p} label={label} columns="sm:grid-cols-[10rem_7rem_6rem_1fr]">
            <p className="font-bold text-field-900 sm:mt-8">{label}</p>
            <TextField
              label="Pressure"
              {...decimal}
              min={0}
              error={e?.value?.message}
              {...register(`tyrePressures.${p}.value`, optionalNumber)}
            />
            <SelectField
              label="Unit"
              options={TYRE_UNIT_OPTIONS}
              error={e?.unit?.message}
              {...register(`tyrePressures.${p}.unit`)}
            />
            <TextField
              label="Tyre size or use"
              autoComplete="off"
              placeholder="710/70R42, field work"
              error={e?.note?.message}
              {...register(`tyrePressures.${p}.note`)}
            />
          </SheetRow>
        );
      })}
    </SheetBlock>
  );
}
