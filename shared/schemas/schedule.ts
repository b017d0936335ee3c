import { z } from 'zod';

const optionalPositive = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .positive({ error: `${label} must be greater than 0` })
    .nullable()
    .default(null);

export const taskPartSchema = z.object({
  partNumber: z.string().trim().min(1, { error: 'Enter the part number' }).max(60),
  description: z.string().trim().max(200).default(''),
  quantity: z
    .number({ error: 'Quantity must be a number' })
    .positive({ error: 'Quantity must be greater than 0' }),
});
export type TaskPart = z.infer<typeof taskPartSchema>;

export const FLUID_UNITS = ['L', 'gal', 'qt', 'kg', 'lb'] as const;
export const taskFluidSchema = z.object({
  kind: z.string().trim().min(1, { error: 'Enter the fluid kind' }).max(80),
  volume: z
    .number({ error: 'Volume must be a number' })
    .positive({ error: 'Volume must be greater than 0' }),
  unit: z.enum(FLUID_UNITS, { error: `Unit must be one of: ${FLUID_UNITS.join(', ')}` }),
});
export type TaskFluid = z.infer<typeof taskFluidSchema>;

export const HAZARDS = [
  'pto',
  'hydraulic_pressure',
  'raised_load',
  'stored_energy',
  'hot_fluid',
  'battery',
] as const;
export type Hazard = (typeof HAZARDS)[number];

const taskFields = {
  name: z
    .string({ error: 'Enter a task name' })
    .trim()
    .min(1, { error: 'Enter a task name' })
    .max(120),
  intervalMeter: optionalPositive('Meter interval'),
  intervalDays: z
    .number({ error: 'Day interval must be a number' })
    .int({ error: 'Day interval must be whole days' })
    .positive({ error: 'Day interval must be greater than 0' })
    .nullable()
    .default(null),
  firstServiceMeter: optionalPositive('First service point'),
  warnMeter: optionalPositive('Warning window (meter)'),
  warnDays: z
    .number({ error: 'Warning window (days) must be a number' })
    .int({ error: 'Warning window must be whole days' })
    .positive({ error: 'Warning window (days) must be greater than 0' })
    .nullable()
    .default(null),
  parts: z.array(taskPartSchema).max(50).default([]),
  fluids: z.array(taskFluidSchema).max(20).default([]),
  labourHours: optionalPositive('Estimated labour'),
  instructions: z.string().max(5000).default(''),
  safetyNotes: z.string().max(2000).default(''),
  hazards: z.array(z.enum(HAZARDS)).default([]),
};

const atLeastOneInterval = {
  check: (t: { intervalMeter: number | null; intervalDays: number | null }) =>
    t.intervalMeter !== null || t.intervalDays !== null,
  params: { error: 'Give a meter interval, a day interval, or both', path: ['intervalMeter'] },
};

export const taskInputSchema = z
  .object(taskFields)
  .refine(atLeastOneInterval.check, atLeastOneInterval.params);
export type TaskInput = z.infer<typeof taskInputSchema>;

export const taskUpdateSchema = z.object(taskFields).partial();

export const lastDoneSchema = z.object({
  lastDoneMeter: z
    .number({ error: 'Meter value must be a number' })
    .min(0, { error: 'Meter value may not be negative' }),
  lastDoneOn: z.iso.date({ error: 'Date must be yyyy-mm-dd' }),
});
export type LastDoneInput = z.infer<typeof lastDoneSchema>;
