import type { Path } from 'react-hook-form';
import { z } from 'zod';
import type { UnitSystem } from '../../../../shared/constants';
import {
  CAPACITY_KEYS,
  FILTER_ROLES,
  TYRE_POSITIONS,
  type CapacityKey,
  type CapacityUnit,
  type FilterRole,
  type TemperatureUnit,
  type TestPressureUnit,
  type TorqueUnit,
  type TyrePosition,
  type TyrePressureUnit,
} from '../../../../shared/schemas/spec-keys';
import {
  specSheetUpdateSchema,
  type SpecSheet,
  type SpecSheetUpdateInput,
} from '../../../../shared/schemas/spec-sheet';

// The spec sheet form's values: every compartment, filter role and tyre has its row (blank when
// not on the sheet), and a blank row is sent as null (cleared). The same zod schema the server
// validates with checks what is sent, so its messages land on the same field names.

export interface SpecSheetFormValues {
  capacities: Record<CapacityKey, { quantity: number | null; unit: CapacityUnit; spec: string }>;
  extraCapacities: { name: string; quantity: number | null; unit: CapacityUnit; spec: string }[];
  filters: Record<FilterRole, string>;
  extraFilters: { name: string; partNumber: string }[];
  tyrePressures: Record<
    TyrePosition,
    { value: number | null; unit: TyrePressureUnit; note: string }
  >;
  torques: { name: string; value: number | null; unit: TorqueUnit; note: string }[];
  testPressures: {
    name: string;
    min: number | null;
    max: number | null;
    unit: TestPressureUnit;
    engineRpm: number | null;
    oilTemperature: { value: number | null; unit: TemperatureUnit };
    conditions: string;
  }[];
  notes: string;
}

/** The units a new row starts in, from the farm's unit system. */
export function defaultUnits(units: UnitSystem) {
  const metric = units === 'metric';
  return {
    capacity: (metric ? 'L' : 'gal') as CapacityUnit,
    tyre: (metric ? 'kPa' : 'psi') as TyrePressureUnit,
    pressure: (metric ? 'kPa' : 'psi') as TestPressureUnit,
    torque: (metric ? 'Nm' : 'lbf_ft') as TorqueUnit,
    temperature: (metric ? 'C' : 'F') as TemperatureUnit,
  };
}

const byKey = <K extends string, V>(keys: readonly K[], value: (k: K) => V) =>
  Object.fromEntries(keys.map((k) => [k, value(k)])) as Record<K, V>;

/** The form's starting values: the sheet as it is, blank rows for what it does not give. */
export function sheetToForm(sheet: SpecSheet, units: UnitSystem): SpecSheetFormValues {
  const u = defaultUnits(units);
  return {
    capacities: byKey(CAPACITY_KEYS, (k) => ({
      ...{ quantity: null, unit: u.capacity, spec: '' },
      ...sheet.capacities[k],
    })),
    extraCapacities: sheet.extraCapacities.map((c) => ({ ...c })),
    filters: byKey(FILTER_ROLES, (r) => sheet.filters[r] ?? ''),
    extraFilters: sheet.extraFilters.map((f) => ({ ...f })),
    tyrePressures: byKey(TYRE_POSITIONS, (p) => ({
      ...{ value: null, unit: u.tyre, note: '' },
      ...sheet.tyrePressures[p],
    })),
    torques: sheet.torques.map((t) => ({ ...t })),
    testPressures: sheet.testPressures.map((t) => ({
      ...t,
      oilTemperature: t.oilTemperature ?? { value: null, unit: u.temperature },
    })),
    notes: sheet.notes,
  };
}

/** The PATCH body: every section, blank rows of keyed sections as null (cleared). */
export function formToPatch(values: SpecSheetFormValues): Record<string, unknown> {
  const blankText = (s: string) => s.trim() === '';
  return {
    capacities: byKey(CAPACITY_KEYS, (k) => {
      const c = values.capacities[k];
      return c.quantity === null && blankText(c.spec) ? null : c;
    }),
    extraCapacities: values.extraCapacities,
    filters: byKey(FILTER_ROLES, (r) => (blankText(values.filters[r]) ? null : values.filters[r])),
    extraFilters: values.extraFilters,
    tyrePressures: byKey(TYRE_POSITIONS, (p) => {
      const t = values.tyrePressures[p];
      return t.value === null && blankText(t.note) ? null : t;
    }),
    torques: values.torques,
    testPressures: values.testPressures.map((t) => ({
      ...t,
      oilTemperature: t.oilTemperature.value === null ? null : t.oilTemperature,
    })),
    notes: values.notes,
  };
}

/** The form's schema: its values made into the PATCH body, then the server's own schema. */
export const specSheetFormSchema = z.preprocess(
  (values) => formToPatch(values as SpecSheetFormValues),
  specSheetUpdateSchema,
) as unknown as z.ZodType<SpecSheetUpdateInput, SpecSheetFormValues>;

/** Every field name the server may point at, the rows there are now included. */
export function specSheetFieldNames(values: SpecSheetFormValues): Path<SpecSheetFormValues>[] {
  const rows = <T>(list: string, items: T[], columns: string[]) =>
    items.flatMap((_, i) => columns.map((c) => `${list}.${i}.${c}`));
  return [
    ...CAPACITY_KEYS.flatMap((k) =>
      ['quantity', 'unit', 'spec'].map((c) => `capacities.${k}.${c}`),
    ),
    ...FILTER_ROLES.map((r) => `filters.${r}`),
    ...TYRE_POSITIONS.flatMap((p) =>
      ['value', 'unit', 'note'].map((c) => `tyrePressures.${p}.${c}`),
    ),
    ...rows('extraCapacities', values.extraCapacities, ['name', 'quantity', 'unit', 'spec']),
    ...rows('extraFilters', values.extraFilters, ['name', 'partNumber']),
    ...rows('torques', values.torques, ['name', 'value', 'unit', 'note']),
    ...rows('testPressures', values.testPressures, [
      'name',
      'min',
      'max',
      'unit',
      'engineRpm',
      'oilTemperature.value',
      'oilTemperature.unit',
      'conditions',
    ]),
    'notes',
  ] as Path<SpecSheetFormValues>[];
}

/** An empty number field is null; a typed one a number. */
export const optionalNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? null : Number(v)),
};
