import { z } from 'zod';
import { DUE_STATUSES, MACHINE_CATEGORIES } from '../constants';
import { boundedNumber, isoDate, PAST_DATES, plainText, uuid } from './common';
import { duePointSchema } from './due';
import {
  checkTaskTiming,
  seasonTaskDefaults,
  seasonTaskFields,
  storedSeasonFields,
} from './task-season';
import { CAPACITY_KEYS, FILTER_ROLES } from './spec-keys';

/**
 * Ranges of a task's numbers (meter units, days, hours). They fit the columns (intervals and
 * warnings numeric(12,2), labour numeric(6,2), days integer) and the trade: a million units
 * covers the longest km interval, twenty years the longest calendar item.
 */
export const TASK_BOUNDS = {
  intervalMeter: { min: 0, max: 1_000_000, exclusiveMin: true },
  intervalDays: { min: 0, max: 7300, exclusiveMin: true, int: true },
  firstServiceMeter: { min: 0, max: 10_000_000, exclusiveMin: true },
  warnMeter: { min: 0, max: 1_000_000, exclusiveMin: true },
  warnDays: { min: 0, max: 365, exclusiveMin: true, int: true },
  labourHours: { min: 0, max: 1000, exclusiveMin: true },
  quantity: { min: 0, max: 100_000, exclusiveMin: true },
  /** a meter value, as readings (numeric(14,2)) */
  meter: { min: 0, max: 10_000_000 },
} as const;

/** A line the machine's spec sheet fills: a filter role (part number) or a capacity (volume). */
const filterRole = z.enum(FILTER_ROLES, {
  error: `Filter role must be one of: ${FILTER_ROLES.join(', ')}`,
});
const capacity = z.enum(CAPACITY_KEYS, {
  error: `Capacity must be one of: ${CAPACITY_KEYS.join(', ')}`,
});

/**
 * A part a task calls for. A wear part (belt, tine, knife) is inspected at each service and
 * replaced only when worn, so the parts forecast and a record's prefilled lines never count it as
 * used; it may go without a part number until the farm enters its own.
 */
export const taskPartSchema = z
  .object({
    partNumber: plainText(60).default(''),
    description: plainText(200).default(''),
    quantity: boundedNumber('Quantity', TASK_BOUNDS.quantity),
    wearPart: z.boolean({ error: 'Wear part must be true or false' }).default(false),
    /** the machine's spec sheet gives this line's part number (spec-sheet-lines.ts) */
    filterRole: filterRole.optional(),
  })
  .refine((p) => p.wearPart || p.partNumber !== '', {
    error: 'Enter the part number',
    path: ['partNumber'],
  });
export type TaskPart = z.infer<typeof taskPartSchema>;
/** A part as stored on a task: rows written before wear parts existed have no `wearPart`. */
export type StoredTaskPart = Omit<TaskPart, 'wearPart'> & { wearPart?: boolean };

export const FLUID_UNITS = ['L', 'gal', 'qt', 'kg', 'lb'] as const;
export const taskFluidSchema = z.object({
  kind: plainText(80, { required: 'Enter the fluid kind' }),
  volume: boundedNumber('Volume', TASK_BOUNDS.quantity),
  unit: z.enum(FLUID_UNITS, { error: `Unit must be one of: ${FLUID_UNITS.join(', ')}` }),
  /** the machine's spec sheet gives this line's volume, unit and fluid (spec-sheet-lines.ts) */
  capacity: capacity.optional(),
});
export type TaskFluid = z.infer<typeof taskFluidSchema>;

export const HAZARDS = [
  'pto',
  'hydraulic_pressure',
  'raised_load',
  'stored_energy',
  'hot_fluid',
  'battery',
  // added with issue 11; the column is text[] with no CHECK, so no migration
  'chemicals',
  'tyres_rims',
  'power_lines',
  'hitching_crush',
] as const;
export type Hazard = (typeof HAZARDS)[number];

/** A task's fields, without defaults: an update changes only the fields it names. */
const taskFields = {
  name: plainText(120, { required: 'Enter a task name' }),
  intervalMeter: boundedNumber('Meter interval', TASK_BOUNDS.intervalMeter).nullable(),
  intervalDays: boundedNumber('Day interval', TASK_BOUNDS.intervalDays).nullable(),
  firstServiceMeter: boundedNumber('First service point', TASK_BOUNDS.firstServiceMeter).nullable(),
  warnMeter: boundedNumber('Warning window (meter)', TASK_BOUNDS.warnMeter).nullable(),
  warnDays: boundedNumber('Warning window (days)', TASK_BOUNDS.warnDays).nullable(),
  parts: z
    .array(taskPartSchema, { error: 'Parts must be a list' })
    .max(50, { error: 'At most 50 parts' }),
  fluids: z
    .array(taskFluidSchema, { error: 'Fluids must be a list' })
    .max(20, { error: 'At most 20 fluids' }),
  labourHours: boundedNumber('Estimated labour', TASK_BOUNDS.labourHours).nullable(),
  instructions: plainText(5000, { multiline: true }),
  safetyNotes: plainText(2000, { multiline: true }),
  hazards: z
    .array(z.enum(HAZARDS, { error: `Hazards must be among: ${HAZARDS.join(', ')}` }), {
      error: 'Hazards must be a list',
    })
    .max(HAZARDS.length, { error: `At most ${HAZARDS.length} hazards` }),
  /** pre-season / storage service: due days before the season starts or after it ends */
  ...seasonTaskFields,
  /** daily care (grease rounds, daily items): the operator signs it off in the walkaround */
  dailyCare: z.boolean({ error: 'Daily care must be true or false' }),
};

const taskInputFields = z.object({
  ...taskFields,
  intervalMeter: taskFields.intervalMeter.default(null),
  intervalDays: taskFields.intervalDays.default(null),
  firstServiceMeter: taskFields.firstServiceMeter.default(null),
  warnMeter: taskFields.warnMeter.default(null),
  warnDays: taskFields.warnDays.default(null),
  parts: taskFields.parts.default([]),
  fluids: taskFields.fluids.default([]),
  labourHours: taskFields.labourHours.default(null),
  instructions: taskFields.instructions.default(''),
  safetyNotes: taskFields.safetyNotes.default(''),
  hazards: taskFields.hazards.default([]),
  ...seasonTaskDefaults,
  dailyCare: taskFields.dailyCare.default(false),
});
// an interval or a season, and a season without a day interval (task-season.ts)
export const taskInputSchema = taskInputFields.superRefine(checkTaskTiming);
export type TaskInput = z.infer<typeof taskInputSchema>;

/**
 * The machine a task is added to or edited on: one of its meters (issue 13), which the meter
 * interval counts on and is in the unit of; left out, the machine's primary meter. Templates
 * carry no meter: they are applied to many machines.
 */
const taskMeterId = uuid;
export const machineTaskInputSchema = taskInputFields
  .extend({ meterId: taskMeterId.optional() })
  .superRefine(checkTaskTiming);
export type MachineTaskInput = z.infer<typeof machineTaskInputSchema>;
/**
 * A task as a template stores it: rows written before daily care existed have no `dailyCare`,
 * rows written before season services no `seasonAnchor` / `seasonOffsetDays`.
 */
export type StoredTaskInput = Omit<TaskInput, 'dailyCare' | SeasonFieldName> & {
  dailyCare?: boolean;
} & Partial<Pick<TaskInput, SeasonFieldName>>;
type SeasonFieldName = 'seasonAnchor' | 'seasonOffsetDays';

/** Only the fields sent; an unknown field is refused by name. */
export const taskUpdateSchema = z
  .object({ ...taskFields, meterId: taskMeterId })
  .partial()
  .strict();
export type TaskUpdateInput = z.infer<typeof taskUpdateSchema>;

/** A schedule template of a machine category: a named list of tasks applied in one step. */
export const scheduleTemplateCreateSchema = z.object({
  category: z.enum(MACHINE_CATEGORIES, {
    error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
  }),
  name: plainText(120, { required: 'Enter a template name' }),
  description: plainText(2000, { multiline: true }).default(''),
  tasks: z
    .array(taskInputSchema, { error: 'A template needs at least one task' })
    .min(1, { error: 'A template needs at least one task' })
    .max(60, { error: 'At most 60 tasks' }),
});
export type ScheduleTemplateCreateInput = z.infer<typeof scheduleTemplateCreateSchema>;

export const lastDoneSchema = z.object({
  lastDoneMeter: boundedNumber('Meter value', TASK_BOUNDS.meter),
  lastDoneOn: isoDate('Date', PAST_DATES),
});
export type LastDoneInput = z.infer<typeof lastDoneSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

/** A task's fields as stored and sent (a template's tasks carry these too). */
const storedTaskFields = {
  name: z.string(),
  intervalMeter: z.number().nullable(),
  intervalDays: z.number().nullable(),
  firstServiceMeter: z.number().nullable(),
  warnMeter: z.number().nullable(),
  warnDays: z.number().nullable(),
  parts: z.array(
    z.object({
      partNumber: z.string(),
      description: z.string(),
      quantity: z.number(),
      /** inspected, replaced when worn: never counted as used at each service */
      wearPart: z.boolean(),
      filterRole: z.enum(FILTER_ROLES).optional(),
    }),
  ),
  fluids: z.array(
    z.object({
      kind: z.string(),
      volume: z.number(),
      unit: z.enum(FLUID_UNITS),
      capacity: z.enum(CAPACITY_KEYS).optional(),
    }),
  ),
  labourHours: z.number().nullable(),
  instructions: z.string(),
  safetyNotes: z.string(),
  hazards: z.array(z.enum(HAZARDS)),
  ...storedSeasonFields,
  /** signed off by the operator in the walkaround; never on the due list or in a mail */
  dailyCare: z.boolean(),
};

/** One line of a machine's schedule, with the due point the server computed for it. */
export const taskSchema = z
  .object({
    id: z.string(),
    machineId: z.string(),
    /** the meter its interval counts on (machine_meters.id) */
    meterId: z.string(),
    ...storedTaskFields,
    /** lifetime meter value */
    lastDoneMeter: z.number().nullable(),
    /** ISO local date (yyyy-mm-dd) */
    lastDoneOn: z.string().nullable(),
    /** "start counting from now" in place of an unknown last service: lifetime meter, ISO date */
    countFromMeter: z.number().nullable(),
    countFromOn: z.string().nullable(),
    due: duePointSchema.nullable(),
  })
  .meta({ id: 'ServiceTask' });
export type Task = z.infer<typeof taskSchema>;

/** A task as the service form offers it: a few fields of the list and its due status now. */
export const taskChoiceSchema = taskSchema
  .pick({ id: true, name: true, hazards: true, safetyNotes: true, labourHours: true })
  .extend({ dueStatus: z.enum(DUE_STATUSES).nullable() });
export type TaskChoice = z.infer<typeof taskChoiceSchema>;

export const scheduleAbilitiesSchema = z.object({ edit: z.boolean(), setLastDone: z.boolean() });

/** GET a machine's tasks. */
export const taskListResponseSchema = z.object({
  data: z.array(taskSchema),
  abilities: scheduleAbilitiesSchema,
});
export type TaskList = z.infer<typeof taskListResponseSchema>;

/** POST, PATCH, last done and count-from-now of one task. */
export const taskResponseSchema = z.object({ data: taskSchema });
export type TaskResponse = z.infer<typeof taskResponseSchema>;
/** Tasks created or changed together (apply a template, add several, count a machine from now). */
export const tasksResponseSchema = z.object({ data: z.array(taskSchema) });
export type TasksResponse = z.infer<typeof tasksResponseSchema>;

export const scheduleTemplateSchema = z
  .object({
    id: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    name: z.string(),
    description: z.string(),
    tasks: z.array(z.object(storedTaskFields)),
  })
  .meta({ id: 'ScheduleTemplate' });
export type ScheduleTemplate = z.infer<typeof scheduleTemplateSchema>;

export const scheduleTemplateListResponseSchema = z.object({
  data: z.array(scheduleTemplateSchema),
  abilities: z.object({ edit: z.boolean() }),
});
export type ScheduleTemplateList = z.infer<typeof scheduleTemplateListResponseSchema>;
export const scheduleTemplateResponseSchema = z.object({ data: scheduleTemplateSchema });
