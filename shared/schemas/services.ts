import { z } from 'zod';
import { uuid, pagingFields } from './common';
import { FLUID_UNITS } from './schedule';

// Service records: one visit to a machine, planned or done. The client's forms use these schemas
// with react-hook-form; the server validates the same ones.

export const SERVICE_STATUSES = ['planned', 'completed', 'cancelled'] as const;
export type ServiceStatus = (typeof SERVICE_STATUSES)[number];
export const SERVICE_STATUS_LABELS: Record<ServiceStatus, string> = {
  planned: 'Planned',
  completed: 'Completed',
  cancelled: 'Cancelled',
};

const isoDate = (label: string) => z.iso.date({ error: `${label} must be a date, yyyy-mm-dd` });
const cost = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .min(0, { error: `${label} may not be negative` })
    .max(10_000_000, { error: `${label} is too large` });

export const servicePartSchema = z.object({
  partNumber: z
    .string({ error: 'Enter the part number' })
    .trim()
    .min(1, { error: 'Enter the part number' })
    .max(60, { error: 'Use at most 60 characters' }),
  description: z.string().trim().max(200, { error: 'Use at most 200 characters' }).default(''),
  quantity: z
    .number({ error: 'Quantity must be a number' })
    .positive({ error: 'Quantity must be greater than 0' })
    .max(100_000, { error: 'Quantity is too large' }),
  unitCost: cost('Unit cost').nullable().default(null),
});
export type ServicePart = z.infer<typeof servicePartSchema>;

export const serviceFluidSchema = z.object({
  kind: z
    .string({ error: 'Enter the fluid kind' })
    .trim()
    .min(1, { error: 'Enter the fluid kind' })
    .max(80, { error: 'Use at most 80 characters' }),
  volume: z
    .number({ error: 'Volume must be a number' })
    .positive({ error: 'Volume must be greater than 0' })
    .max(100_000, { error: 'Volume is too large' }),
  unit: z.enum(FLUID_UNITS, { error: `Unit must be one of: ${FLUID_UNITS.join(', ')}` }),
  /** cost per unit of volume (per L, gal, …) */
  unitCost: cost('Unit cost').nullable().default(null),
});
export type ServiceFluid = z.infer<typeof serviceFluidSchema>;

export const otherCostSchema = z.object({
  description: z
    .string({ error: 'Describe the cost' })
    .trim()
    .min(1, { error: 'Describe the cost' })
    .max(200, { error: 'Use at most 200 characters' }),
  amount: cost('Amount'),
});
export type OtherCost = z.infer<typeof otherCostSchema>;

export const measurementSchema = z
  .object({
    name: z
      .string({ error: 'Name the measurement' })
      .trim()
      .min(1, { error: 'Name the measurement' })
      .max(80, { error: 'Use at most 80 characters' }),
    value: z
      .number({ error: 'Value must be a number' })
      .min(-1_000_000, { error: 'Value is out of range' })
      .max(1_000_000, { error: 'Value is out of range' }),
    unit: z.string().trim().max(20, { error: 'Use at most 20 characters' }).default(''),
    specMin: z.number({ error: 'Spec minimum must be a number' }).nullable().default(null),
    specMax: z.number({ error: 'Spec maximum must be a number' }).nullable().default(null),
  })
  .refine((m) => m.specMin === null || m.specMax === null || m.specMin <= m.specMax, {
    error: 'Spec maximum must not be below the spec minimum',
    path: ['specMax'],
  });
export type MeasurementInput = z.infer<typeof measurementSchema>;

/** Something counted, removed or set on the way apart that must go back the same way. */
export const reassemblySettingSchema = z.object({
  what: z
    .string({ error: 'Say what was counted, removed or set' })
    .trim()
    .min(1, { error: 'Say what was counted, removed or set' })
    .max(200, { error: 'Use at most 200 characters' }),
  value: z
    .string({ error: 'Enter the setting, e.g. 3½ turns out' })
    .trim()
    .min(1, { error: 'Enter the setting, e.g. 3½ turns out' })
    .max(200, { error: 'Use at most 200 characters' }),
  restored: z.boolean({ error: 'Restored must be true or false' }).default(false),
});
export type ReassemblySetting = z.infer<typeof reassemblySettingSchema>;

const idList = (max: number, what: string) =>
  z.array(uuid).max(max, { error: `At most ${max} ${what}` });

/** Fields any record carries, planned or done (no defaults: an update changes only what it names). */
const recordFields = {
  taskIds: idList(60, 'tasks'),
  technicianIds: idList(20, 'technicians'),
  labourHours: z
    .number({ error: 'Labour hours must be a number' })
    .min(0, { error: 'Labour hours may not be negative' })
    .max(2000, { error: 'Labour hours is too large' })
    .nullable(),
  parts: z.array(servicePartSchema).max(100, { error: 'At most 100 part lines' }),
  fluids: z.array(serviceFluidSchema).max(50, { error: 'At most 50 fluid lines' }),
  otherCosts: z.array(otherCostSchema).max(50, { error: 'At most 50 cost lines' }),
  notes: z.string().max(10_000, { error: 'Use at most 10,000 characters' }),
  measurements: z.array(measurementSchema).max(100, { error: 'At most 100 measurements' }),
  reassemblySettings: z.array(reassemblySettingSchema).max(100, { error: 'At most 100 settings' }),
  /** why a setting is not ticked as restored, when completing anyway */
  unrestoredReason: z.string().trim().max(2000, { error: 'Use at most 2,000 characters' }),
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
  performedOn: isoDate('Performed on'),
  meterValue: z
    .number({ error: 'Meter value at service must be a number' })
    .min(0, { error: 'Meter value may not be negative' })
    .max(10_000_000, { error: 'Meter value is too large' }),
  /** when the meter was read; default: now when performed today, else midday local time */
  meterReadAt: z.iso
    .datetime({ offset: true, error: 'Meter read at must be an ISO date-time' })
    .optional(),
};

export const serviceRecordCreateSchema = z
  .object({
    status: z.enum(['planned', 'completed'], { error: 'Status must be planned or completed' }),
    plannedFor: isoDate('Planned for').nullable().default(null),
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

export const serviceRecordUpdateSchema = z
  .object({ plannedFor: isoDate('Planned for').nullable(), ...recordFields })
  .partial();
export type ServiceRecordUpdateInput = z.infer<typeof serviceRecordUpdateSchema>;

/** Completing a planned record: the visit's facts, plus any field to change on the way. */
export const serviceRecordCompleteSchema = z
  .object(recordFields)
  .partial()
  .extend(completionFields);
export type ServiceRecordCompleteInput = z.infer<typeof serviceRecordCompleteSchema>;

export const serviceHistoryQuerySchema = z.object({
  q: z.string().trim().max(100, { error: 'Use at most 100 characters' }).optional(),
  status: z
    .enum(SERVICE_STATUSES, { error: `Status must be one of: ${SERVICE_STATUSES.join(', ')}` })
    .optional(),
  ...pagingFields(20, 100),
});
export type ServiceHistoryQuery = z.infer<typeof serviceHistoryQuerySchema>;

export const shopWeekQuerySchema = z.object({
  start: isoDate('Start').optional(),
});

export const measurementSeriesQuerySchema = z.object({
  name: z
    .string({ error: 'Give the measurement name' })
    .trim()
    .min(1, { error: 'Give the measurement name' })
    .max(80),
});

/** Largest attachment (photo or PDF), bytes. */
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
export const ATTACHMENTS_PER_RECORD = 40;
