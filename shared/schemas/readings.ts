import { z } from 'zod';
import { uuid, pagingFields } from './common';

export const readingCreateSchema = z.object({
  value: z
    .number({ error: 'Meter value must be a number' })
    .min(0, { error: 'Meter value may not be negative' })
    .max(10_000_000, { error: 'Meter value is too large' }),
  takenAt: z.iso
    .datetime({
      offset: true,
      error: 'Time taken must be an ISO date-time, like 2026-05-01T07:30:00-05:00',
    })
    .optional(),
});
export type ReadingCreateInput = z.infer<typeof readingCreateSchema>;

export const readingUpdateSchema = readingCreateSchema.partial();

export const bulkReadingsSchema = z.object({
  readings: z
    .array(readingCreateSchema.extend({ machineId: uuid }))
    .min(1, { error: 'Enter at least one reading' })
    .max(2000),
});
export type BulkReadingsInput = z.infer<typeof bulkReadingsSchema>;

export const meterReplacementSchema = z.object({
  oldFinalValue: z
    .number({ error: 'Old meter final value must be a number' })
    .min(0, { error: 'Old meter final value may not be negative' }),
  newStartValue: z
    .number({ error: 'New meter start value must be a number' })
    .min(0, { error: 'New meter start value may not be negative' }),
  replacedAt: z.iso.datetime({ offset: true, error: 'Replaced at must be an ISO date-time' }),
  note: z.string().max(500).default(''),
});
export type MeterReplacementInput = z.infer<typeof meterReplacementSchema>;

export const dueQuerySchema = z.object({
  horizon: z.coerce
    .number()
    .int()
    .refine((n) => [7, 30, 90, 365].includes(n), { error: 'Horizon must be 7, 30, 90 or 365 days' })
    .optional(),
  category: z.string().optional(),
  status: z.enum(['overdue', 'due_soon', 'ok', 'no_forecast']).optional(),
  machineId: uuid.optional(),
});
export type DueQuery = z.infer<typeof dueQuerySchema>;

export const dueListQuerySchema = dueQuerySchema.extend({
  ...pagingFields(100, 500),
});
export type DueListQuery = z.infer<typeof dueListQuerySchema>;
