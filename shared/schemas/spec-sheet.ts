import { z } from 'zod';
import { boundedNumber, plainText } from './common';
import { TASK_BOUNDS } from './schedule';
import {
  CAPACITY_KEYS,
  CAPACITY_UNITS,
  FILTER_ROLES,
  TEMPERATURE_UNITS,
  TEST_PRESSURE_UNITS,
  TORQUE_UNITS,
  TYRE_POSITIONS,
  TYRE_PRESSURE_UNITS,
} from './spec-keys';

// A machine's spec sheet (issue 11): capacities and fluid specifications, filter numbers, tyre
// pressures, torques and test pressures with the conditions they hold at — all as the farm or its
// dealer copies them from the machine's manual. Every section is optional. A PATCH names the
// sections it changes: in a keyed section (capacities, filters, tyre pressures) only the keys
// sent change and `null` clears one; a list (extra lines, torques, test pressures) is replaced
// whole.

/**
 * Ranges of the sheet's numbers. A capacity becomes a task's fluid volume, so it keeps to the
 * task's bound; the others keep to the trade with room to spare (100,000 kPa is 1,000 bar, above
 * any farm hydraulic test; 2,000 kPa is 290 psi, above any farm tyre).
 */
export const SPEC_BOUNDS = {
  quantity: TASK_BOUNDS.quantity,
  testPressure: { min: 0, max: 100_000 },
  tyrePressure: { min: 0, max: 2000, exclusiveMin: true },
  torque: { min: 0, max: 50_000, exclusiveMin: true },
  engineRpm: { min: 0, max: 10_000, exclusiveMin: true, int: true },
  temperature: { min: -60, max: 250 },
} as const;

/** A fluid specification names the fluid on the task's line ("Engine oil, SAE 15W-40 …"): the
 * line's kind holds 80 characters and the longest compartment name takes 28 of them. */
export const FLUID_SPEC_MAX = 50;

const unitOf = <T extends readonly [string, ...string[]]>(units: T, what: string) =>
  z.enum(units, { error: `${what} must be one of: ${units.join(', ')}` });

const fluidSpec = plainText(FLUID_SPEC_MAX);

/** One compartment: what a change takes (the manual's refill figure) and its fluid. */
export const capacitySchema = z
  .object({
    quantity: boundedNumber('Quantity', SPEC_BOUNDS.quantity).nullable().default(null),
    unit: unitOf(CAPACITY_UNITS, 'Unit'),
    /** the fluid as the manual names it, e.g. "SAE 15W-40, API CK-4" */
    spec: fluidSpec.default(''),
  })
  .strict()
  .refine((c) => c.quantity !== null || c.spec !== '', {
    error: 'Give the quantity or the fluid specification (send null to clear the compartment)',
    path: ['quantity'],
  });
export type Capacity = z.infer<typeof capacitySchema>;

export const extraCapacitySchema = z
  .object({
    name: plainText(60, { required: 'Name the compartment' }),
    quantity: boundedNumber('Quantity', SPEC_BOUNDS.quantity).nullable().default(null),
    unit: unitOf(CAPACITY_UNITS, 'Unit'),
    spec: fluidSpec.default(''),
  })
  .strict();

const partNumber = plainText(60, { required: 'Enter the part number (send null to clear it)' });

export const extraFilterSchema = z
  .object({
    name: plainText(80, { required: 'Say what the part is' }),
    partNumber: plainText(60, { required: 'Enter the part number' }),
  })
  .strict();

export const tyrePressureSchema = z
  .object({
    value: boundedNumber('Pressure', SPEC_BOUNDS.tyrePressure),
    unit: unitOf(TYRE_PRESSURE_UNITS, 'Unit'),
    /** the tyre size or the use it holds for, e.g. "710/70R42, field work" */
    note: plainText(120).default(''),
  })
  .strict();

export const torqueSchema = z
  .object({
    name: plainText(80, { required: 'Say what is torqued, e.g. wheel nuts' }),
    value: boundedNumber('Torque', SPEC_BOUNDS.torque),
    unit: unitOf(TORQUE_UNITS, 'Unit'),
    note: plainText(120).default(''),
  })
  .strict();

export const testPressureSchema = z
  .object({
    name: plainText(80, { required: 'Name the test, e.g. PTO clutch pressure' }),
    min: boundedNumber('Minimum', SPEC_BOUNDS.testPressure).nullable().default(null),
    max: boundedNumber('Maximum', SPEC_BOUNDS.testPressure).nullable().default(null),
    unit: unitOf(TEST_PRESSURE_UNITS, 'Unit'),
    /** the engine speed the figure holds at */
    engineRpm: boundedNumber('Engine speed', SPEC_BOUNDS.engineRpm).nullable().default(null),
    oilTemperature: z
      .object({
        value: boundedNumber('Oil temperature', SPEC_BOUNDS.temperature),
        unit: unitOf(TEMPERATURE_UNITS, 'Temperature unit'),
      })
      .strict()
      .nullable()
      .default(null),
    /** any other condition: gear, range, test port, function held over relief */
    conditions: plainText(200).default(''),
  })
  .strict()
  .superRefine((p, ctx) => {
    if (p.min === null && p.max === null)
      ctx.addIssue({
        code: 'custom',
        path: ['min'],
        message: 'Give the minimum, the maximum or both',
      });
    else if (p.min !== null && p.max !== null && p.min > p.max)
      ctx.addIssue({
        code: 'custom',
        path: ['max'],
        message: 'The maximum must not be below the minimum',
      });
  });
export type TestPressure = z.infer<typeof testPressureSchema>;

/**
 * An object of the given keys, each optional: a value sets that key, `null` clears it; the
 * section itself sent as `null` clears every key.
 */
function keyed<K extends string, S extends z.ZodType>(keys: readonly K[], value: S) {
  const shape = Object.fromEntries(keys.map((k) => [k, value.nullable().optional()]));
  return z
    .object(shape as Record<K, z.ZodOptional<z.ZodNullable<S>>>)
    .strict()
    .nullable();
}

const list = <S extends z.ZodType>(item: S, max: number, what: string) =>
  z
    .array(item, { error: `${what} must be a list` })
    .max(max, { error: `At most ${max} ${what.toLowerCase()}` })
    .nullable()
    .transform((v) => v ?? []);

/** Two tests of one name would give a measurement two specs: names are unique, case aside. */
const uniqueNames = (items: { name: string }[], ctx: z.RefinementCtx) => {
  const seen = new Set<string>();
  items.forEach((t, i) => {
    const key = t.name.toLowerCase();
    if (seen.has(key))
      ctx.addIssue({
        code: 'custom',
        path: [i, 'name'],
        message: `"${t.name}" is on the sheet already`,
      });
    seen.add(key);
  });
};

/** The sheet's sections, without defaults: a PATCH changes only the sections it names. */
const sheetFields = {
  capacities: keyed(CAPACITY_KEYS, capacitySchema),
  extraCapacities: list(extraCapacitySchema, 20, 'Extra capacities'),
  filters: keyed(FILTER_ROLES, partNumber),
  extraFilters: list(extraFilterSchema, 30, 'Extra parts'),
  tyrePressures: keyed(TYRE_POSITIONS, tyrePressureSchema),
  torques: list(torqueSchema, 30, 'Torques'),
  testPressures: list(testPressureSchema, 30, 'Test pressures').superRefine(uniqueNames),
  notes: plainText(2000, { multiline: true }),
};

export const specSheetUpdateSchema = z.object(sheetFields).partial().strict();
export type SpecSheetUpdateInput = z.infer<typeof specSheetUpdateSchema>;
/** What the form edits (its values before parsing). */
export type SpecSheetFormInput = z.input<typeof specSheetUpdateSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

const capacityOut = z.object({
  quantity: z.number().nullable(),
  unit: z.enum(CAPACITY_UNITS),
  spec: z.string(),
});
const partial = <K extends string, S extends z.ZodType>(keys: readonly K[], value: S) =>
  z.object(
    Object.fromEntries(keys.map((k) => [k, value.optional()])) as Record<K, z.ZodOptional<S>>,
  );

/** A sheet as stored: absent keys and empty lists are not on the sheet. */
export const specSheetDataSchema = z.object({
  capacities: partial(CAPACITY_KEYS, capacityOut),
  extraCapacities: z.array(capacityOut.extend({ name: z.string() })),
  filters: partial(FILTER_ROLES, z.string()),
  extraFilters: z.array(z.object({ name: z.string(), partNumber: z.string() })),
  tyrePressures: partial(
    TYRE_POSITIONS,
    z.object({ value: z.number(), unit: z.enum(TYRE_PRESSURE_UNITS), note: z.string() }),
  ),
  torques: z.array(
    z.object({
      name: z.string(),
      value: z.number(),
      unit: z.enum(TORQUE_UNITS),
      note: z.string(),
    }),
  ),
  testPressures: z.array(
    z.object({
      name: z.string(),
      min: z.number().nullable(),
      max: z.number().nullable(),
      unit: z.enum(TEST_PRESSURE_UNITS),
      engineRpm: z.number().nullable(),
      oilTemperature: z.object({ value: z.number(), unit: z.enum(TEMPERATURE_UNITS) }).nullable(),
      conditions: z.string(),
    }),
  ),
  notes: z.string(),
});
export type SpecSheetData = z.infer<typeof specSheetDataSchema>;

export const specSheetSchema = specSheetDataSchema
  .extend({
    machineId: z.string(),
    /** null: nothing entered yet */
    updatedAt: z.string().nullable(),
  })
  .meta({ id: 'SpecSheet' });
export type SpecSheet = z.infer<typeof specSheetSchema>;

export const specSheetResponseSchema = z.object({
  data: specSheetSchema,
  abilities: z.object({ update: z.boolean() }),
});
export type SpecSheetResponse = z.infer<typeof specSheetResponseSchema>;

/** PATCH answers the sheet and how many of the machine's tasks took new lines from it. */
export const specSheetSavedResponseSchema = specSheetResponseSchema.extend({
  tasksUpdated: z.number(),
});
export type SpecSheetSaved = z.infer<typeof specSheetSavedResponseSchema>;
