import { z } from 'zod';
import {
  boundedNumber,
  CALENDAR_DATES,
  isoDate,
  isoDateTime,
  pagingFields,
  PAST_DATES,
  PLAN_DATES,
  plainText,
  uuid,
} from './common';
import { FLUID_UNITS } from './schedule';
import { MONEY_MAX_MINOR, minorAmount } from './money';

// Service records: one visit to a machine, planned or done. The client's forms use these schemas
// with react-hook-form; the server validates the same ones.

export const SERVICE_STATUSES = ['planned', 'completed', 'cancelled'] as const;
export type ServiceStatus = (typeof SERVICE_STATUSES)[number];
export const SERVICE_STATUS_LABELS: Record<ServiceStatus, string> = {
  planned: 'Planned',
  completed: 'Completed',
  cancelled: 'Cancelled',
};

/**
 * Ranges of a record's numbers. Labour fits numeric(8,2), meter values numeric(14,2) and
 * measurements numeric(16,4); costs (integer minor units) and quantities live in JSON but keep
 * to the trade. A line's cost (quantity × unit cost) stays under `lineMinor`, so the sum of a
 * record's lines is an exact integer.
 */
export const SERVICE_BOUNDS = {
  costMinor: { max: MONEY_MAX_MINOR },
  lineMinor: { max: 10_000_000_000_000 },
  quantity: { min: 0, max: 100_000, exclusiveMin: true },
  labourHours: { min: 0, max: 2000 },
  meter: { min: 0, max: 10_000_000 },
  measurement: { min: -1_000_000, max: 1_000_000 },
} as const;

const cost = (label: string) => minorAmount(label, SERVICE_BOUNDS.costMinor.max);

/** A line's quantity × unit cost stays within SERVICE_BOUNDS.lineMinor (else the rule names unitCostMinor). */
const withinLineBound = (quantity: number, unitCostMinor: number | null) =>
  unitCostMinor === null || quantity * unitCostMinor <= SERVICE_BOUNDS.lineMinor.max;
const lineBoundRule = {
  error: `The line's cost (quantity × unit cost) must be at most ${SERVICE_BOUNDS.lineMinor.max.toLocaleString('en-US')} minor units`,
  path: ['unitCostMinor'],
};

export const servicePartSchema = z
  .object({
    partNumber: plainText(60, { required: 'Enter the part number' }),
    description: plainText(200).default(''),
    quantity: boundedNumber('Quantity', SERVICE_BOUNDS.quantity),
    /** price of one, in minor units of the farm's currency */
    unitCostMinor: cost('Unit cost').nullable().default(null),
  })
  .refine((p) => withinLineBound(p.quantity, p.unitCostMinor), lineBoundRule);
export type ServicePart = z.infer<typeof servicePartSchema>;

export const serviceFluidSchema = z
  .object({
    kind: plainText(80, { required: 'Enter the fluid kind' }),
    volume: boundedNumber('Volume', SERVICE_BOUNDS.quantity),
    unit: z.enum(FLUID_UNITS, { error: `Unit must be one of: ${FLUID_UNITS.join(', ')}` }),
    /** price per unit of volume (per L, gal, …), in minor units of the farm's currency */
    unitCostMinor: cost('Unit cost').nullable().default(null),
  })
  .refine((f) => withinLineBound(f.volume, f.unitCostMinor), lineBoundRule);
export type ServiceFluid = z.infer<typeof serviceFluidSchema>;

export const otherCostSchema = z.object({
  description: plainText(200, { required: 'Describe the cost' }),
  /** minor units of the farm's currency */
  amountMinor: cost('Amount'),
});
export type OtherCost = z.infer<typeof otherCostSchema>;

export const measurementSchema = z
  .object({
    name: plainText(80, { required: 'Name the measurement' }),
    value: boundedNumber('Value', SERVICE_BOUNDS.measurement),
    unit: plainText(20).default(''),
    specMin: boundedNumber('Spec minimum', SERVICE_BOUNDS.measurement).nullable().default(null),
    specMax: boundedNumber('Spec maximum', SERVICE_BOUNDS.measurement).nullable().default(null),
  })
  .refine((m) => m.specMin === null || m.specMax === null || m.specMin <= m.specMax, {
    error: 'Spec maximum must not be below the spec minimum',
    path: ['specMax'],
  });
export type MeasurementInput = z.infer<typeof measurementSchema>;

/** Something counted, removed or set on the way apart that must go back the same way. */
export const reassemblySettingSchema = z.object({
  what: plainText(200, { required: 'Say what was counted, removed or set' }),
  value: plainText(200, { required: 'Enter the setting, e.g. 3½ turns out' }),
  restored: z.boolean({ error: 'Restored must be true or false' }).default(false),
});
export type ReassemblySetting = z.infer<typeof reassemblySettingSchema>;

const idList = (max: number, what: string) =>
  z
    .array(uuid, { error: `Give the ${what} as a list of ids` })
    .max(max, { error: `At most ${max} ${what}` });

/** Fields any record carries, planned or done (no defaults: an update changes only what it names). */
const recordFields = {
  taskIds: idList(60, 'tasks'),
  technicianIds: idList(20, 'technicians'),
  labourHours: boundedNumber('Labour hours', SERVICE_BOUNDS.labourHours).nullable(),
  parts: z
    .array(servicePartSchema, { error: 'Parts must be a list' })
    .max(100, { error: 'At most 100 part lines' }),
  fluids: z
    .array(serviceFluidSchema, { error: 'Fluids must be a list' })
    .max(50, { error: 'At most 50 fluid lines' }),
  otherCosts: z
    .array(otherCostSchema, { error: 'Other costs must be a list' })
    .max(50, { error: 'At most 50 cost lines' }),
  notes: plainText(10_000, { multiline: true }),
  measurements: z
    .array(measurementSchema, { error: 'Measurements must be a list' })
    .max(100, { error: 'At most 100 measurements' }),
  reassemblySettings: z
    .array(reassemblySettingSchema, { error: 'Reassembly settings must be a list' })
    .max(100, { error: 'At most 100 settings' }),
  /** why a setting is not ticked as restored, when completing anyway */
  unrestoredReason: plainText(2000, { multiline: true }),
  closesDefectIds: idList(50, 'defects'),
};

/** A new record: lists default to empty; parts and fluids omitted are prefilled from the tasks. */
const newRecordFields = {
  taskIds: recordFields.taskIds.default([]),
  technicianIds: recordFields.technicianIds.default([]),
  labourHours: recordFields.labourHours.default(null),
  parts: recordFields.parts.optional(),
  fluids: recordFields.fluids.optional(),
  otherCosts: recordFields.otherCosts.default([]),
  notes: recordFields.notes.default(''),
  measurements: recordFields.measurements.default([]),
  reassemblySettings: recordFields.reassemblySettings.default([]),
  unrestoredReason: recordFields.unrestoredReason.default(''),
  closesDefectIds: recordFields.closesDefectIds.default([]),
};

const completionFields = {
  performedOn: isoDate('Performed on', PAST_DATES),
  meterValue: boundedNumber('Meter value at service', SERVICE_BOUNDS.meter),
  /** when the meter was read; default: now when performed today, else midday local time */
  meterReadAt: isoDateTime('Meter read at', PAST_DATES).optional(),
};

export const serviceRecordCreateSchema = z
  .object({
    status: z.enum(['planned', 'completed'], { error: 'Status must be planned or completed' }),
    plannedFor: isoDate('Planned for', PLAN_DATES).nullable().default(null),
    performedOn: completionFields.performedOn.optional(),
    meterValue: completionFields.meterValue.optional(),
    meterReadAt: completionFields.meterReadAt,
    ...newRecordFields,
  })
  .superRefine((r, ctx) => {
    if (r.status === 'planned' && !r.plannedFor)
      ctx.addIssue({
        code: 'custom',
        path: ['plannedFor'],
        message: 'Give the date it is booked for',
      });
    if (r.status === 'completed' && !r.performedOn)
      ctx.addIssue({ code: 'custom', path: ['performedOn'], message: 'Give the date it was done' });
    if (r.status === 'completed' && r.meterValue === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['meterValue'],
        message: 'Enter the meter value at service',
      });
  });
export type ServiceRecordCreateInput = z.infer<typeof serviceRecordCreateSchema>;

/** Only the fields sent; an unknown field is refused by name. */
export const serviceRecordUpdateSchema = z
  .object({ plannedFor: isoDate('Planned for', PLAN_DATES).nullable(), ...recordFields })
  .partial()
  .strict();
export type ServiceRecordUpdateInput = z.infer<typeof serviceRecordUpdateSchema>;

/** Completing a planned record: the visit's facts, plus any field to change on the way. */
export const serviceRecordCompleteSchema = z
  .object(recordFields)
  .partial()
  .extend(completionFields);
export type ServiceRecordCompleteInput = z.infer<typeof serviceRecordCompleteSchema>;

export const serviceHistoryQuerySchema = z.object({
  q: plainText(100).optional(),
  status: z
    .enum(SERVICE_STATUSES, { error: `Status must be one of: ${SERVICE_STATUSES.join(', ')}` })
    .optional(),
  ...pagingFields(20, 100),
});
export type ServiceHistoryQuery = z.infer<typeof serviceHistoryQuerySchema>;

export const shopWeekQuerySchema = z.object({
  start: isoDate('Start', CALENDAR_DATES).optional(),
});

export const measurementSeriesQuerySchema = z.object({
  name: plainText(80, { required: 'Give the measurement name' }),
});

/** Largest attachment (photo or PDF), bytes. */
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
export const ATTACHMENTS_PER_RECORD = 40;
