import { z } from 'zod';
import { MACHINE_CATEGORIES } from '../constants';
import { boundedNumber, isoDateTime, pagingFields, PAST_DATES, plainText, uuid } from './common';

/** Range of a meter value in any unit; fits numeric(14,2) with room for lifetime totals. */
export const METER_BOUNDS = { min: 0, max: 10_000_000 } as const;

const readingFields = {
  value: boundedNumber('Meter value', METER_BOUNDS),
  takenAt: isoDateTime('Time taken', PAST_DATES),
};

export const readingCreateSchema = z.object({
  value: readingFields.value,
  takenAt: readingFields.takenAt.optional(),
});
export type ReadingCreateInput = z.infer<typeof readingCreateSchema>;

/** A correction: only the fields sent; an unknown field is refused by name. */
export const readingUpdateSchema = z.object(readingFields).partial().strict();

export const bulkReadingsSchema = z.object({
  readings: z
    .array(readingCreateSchema.extend({ machineId: uuid }), {
      error: 'Readings must be a list',
    })
    .min(1, { error: 'Enter at least one reading' })
    .max(2000, { error: 'At most 2,000 readings at once' }),
});
export type BulkReadingsInput = z.infer<typeof bulkReadingsSchema>;

export const meterReplacementSchema = z.object({
  oldFinalValue: boundedNumber('Old meter final value', METER_BOUNDS),
  newStartValue: boundedNumber('New meter start value', METER_BOUNDS),
  replacedAt: isoDateTime('Replaced at', PAST_DATES),
  note: plainText(500, { multiline: true }).default(''),
});
export type MeterReplacementInput = z.infer<typeof meterReplacementSchema>;

export const dueQuerySchema = z.object({
  horizon: z.coerce
    .number()
    .int()
    .refine((n) => [7, 30, 90, 365].includes(n), { error: 'Horizon must be 7, 30, 90 or 365 days' })
    .optional(),
  category: z
    .enum(MACHINE_CATEGORIES, {
      error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
    })
    .optional(),
  status: z.enum(['overdue', 'due_soon', 'ok', 'no_forecast', 'history_unknown']).optional(),
  machineId: uuid.optional(),
});
export type DueQuery = z.infer<typeof dueQuerySchema>;

export const dueListQuerySchema = dueQuerySchema.extend({
  ...pagingFields(100, 500),
});
export type DueListQuery = z.infer<typeof dueListQuerySchema>;
