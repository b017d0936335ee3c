import { z } from 'zod';
import { MACHINE_CATEGORIES, METER_CHANGE_KINDS, READING_SOURCES } from '../constants';
import { boundedNumber, isoDateTime, pagingFields, PAST_DATES, plainText, uuid } from './common';
import { lastReadingSchema } from './machines';
import { machineRefSchema } from './refs';

/** Range of a meter value in any unit; fits numeric(14,2) with room for lifetime totals. */
export const METER_BOUNDS = { min: 0, max: 10_000_000 } as const;

const readingFields = {
  value: boundedNumber('Meter value', METER_BOUNDS),
  takenAt: isoDateTime('Time taken', PAST_DATES),
};

/** One of the machine's meters (machine_meters.id); left out, its primary meter. */
const meterIdField = uuid.optional();

export const readingCreateSchema = z.object({
  value: readingFields.value,
  takenAt: readingFields.takenAt.optional(),
  meterId: meterIdField,
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
  meterId: meterIdField,
  oldFinalValue: boundedNumber('Old meter final value', METER_BOUNDS),
  newStartValue: boundedNumber('New meter start value', METER_BOUNDS),
  replacedAt: isoDateTime('Replaced at', PAST_DATES),
  note: plainText(500, { multiline: true }).default(''),
});
export type MeterReplacementInput = z.infer<typeof meterReplacementSchema>;

/**
 * A counter reset (a bale counter zeroed): recorded like a replacement of the same meter, the
 * count before the reset and the one it restarted from (usually 0), at the reset's time.
 */
export const counterResetSchema = z.object({
  meterId: meterIdField,
  oldFinalValue: boundedNumber('Count before the reset', METER_BOUNDS),
  newStartValue: boundedNumber('Count after the reset', METER_BOUNDS).default(0),
  resetAt: isoDateTime('Reset at', PAST_DATES),
  note: plainText(500, { multiline: true }).default(''),
});
export type CounterResetInput = z.infer<typeof counterResetSchema>;

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

// ── Responses ────────────────────────────────────────────────────────────────────────────────

export const readingSchema = z
  .object({
    id: z.string(),
    meterId: z.string(),
    /** as the meter showed it */
    value: z.number(),
    /** continuous across meter replacements; what the forecast and the chart use */
    lifetimeValue: z.number(),
    takenAt: z.string(),
    source: z.enum(READING_SOURCES),
    /** the name of the API key a telematics reading came with; null for any other reading */
    sourceName: z.string().nullable(),
    enteredBy: z.string().nullable(),
  })
  .meta({ id: 'MeterReading' });
export type Reading = z.infer<typeof readingSchema>;

export const meterReplacementRecordSchema = z
  .object({
    id: z.string(),
    meterId: z.string(),
    /** a new meter fitted, or the same counter reset */
    kind: z.enum(METER_CHANGE_KINDS),
    replacedAt: z.string(),
    oldFinalValue: z.number(),
    newStartValue: z.number(),
    note: z.string(),
  })
  .meta({ id: 'MeterReplacement' });
export type MeterReplacement = z.infer<typeof meterReplacementRecordSchema>;

/** GET a machine's readings: newest first, with its meter replacements. */
export const readingHistoryResponseSchema = z.object({
  data: z.array(readingSchema),
  replacements: z.array(meterReplacementRecordSchema),
});
export type ReadingHistory = z.infer<typeof readingHistoryResponseSchema>;

/** What one logged reading became: stored, or an identical repeat that was ignored. */
export const READING_OUTCOMES = ['added', 'duplicate'] as const;

/** POST a reading: the stored reading, or null for an ignored repeat. */
export const readingLoggedResponseSchema = z.object({
  data: readingSchema.nullable(),
  status: z.enum(READING_OUTCOMES),
});
export type ReadingLogged = z.infer<typeof readingLoggedResponseSchema>;

/** PATCH a reading. */
export const readingResponseSchema = z.object({ data: readingSchema });
export type ReadingResponse = z.infer<typeof readingResponseSchema>;

/** POST a meter replacement. */
export const meterReplacementResponseSchema = z.object({ data: meterReplacementRecordSchema });
export type MeterReplacementResponse = z.infer<typeof meterReplacementResponseSchema>;

/** One machine the caller may log hours for, with its last reading (GET readings/latest). */
export const latestReadingSchema = z.object({
  machine: machineRefSchema,
  lastReading: lastReadingSchema.nullable(),
});
export type LatestReading = z.infer<typeof latestReadingSchema>;
export const latestReadingsResponseSchema = z.object({ data: z.array(latestReadingSchema) });
export type LatestReadings = z.infer<typeof latestReadingsResponseSchema>;

export const bulkReadingOutcomeSchema = z.object({
  machineId: z.string(),
  meterId: z.string(),
  status: z.enum(READING_OUTCOMES),
});
export type BulkReadingOutcome = z.infer<typeof bulkReadingOutcomeSchema>;
export const bulkReadingsResponseSchema = z.object({ data: z.array(bulkReadingOutcomeSchema) });
export type BulkReadingsResponse = z.infer<typeof bulkReadingsResponseSchema>;

/** The reading CSV import's limits: rows per file (the header not counted) and bytes. */
export const READING_IMPORT_LIMITS = { maxRows: 500_000, maxBytes: 50 * 1024 * 1024 } as const;

/** One row of a CSV file of readings as the server read and checked it. */
export const readingImportRowSchema = z.object({
  /** the file line (the header is line 1) */
  line: z.number(),
  fleetNumber: z.string(),
  machine: z
    .object({ id: z.string(), name: z.string(), fleetNumber: z.string(), meterUnit: z.string() })
    .nullable(),
  takenAt: z.string().nullable(),
  value: z.number().nullable(),
  status: z.enum(['new', 'duplicate', 'error']),
  error: z.string().nullable(),
});
export type ImportPreviewRow = z.infer<typeof readingImportRowSchema>;

export const readingImportPreviewSchema = z.object({
  /** every row of a small file; of a large one its first rows and its first errors, by line */
  rows: z.array(readingImportRowSchema),
  summary: z.object({
    total: z.number(),
    new: z.number(),
    duplicates: z.number(),
    errors: z.number(),
  }),
});
export type ImportPreview = z.infer<typeof readingImportPreviewSchema>;
export const readingImportPreviewResponseSchema = z.object({ data: readingImportPreviewSchema });
export type ImportPreviewResponse = z.infer<typeof readingImportPreviewResponseSchema>;

export const readingImportResultSchema = z.object({
  added: z.number(),
  duplicates: z.number(),
  total: z.number(),
});
export type ImportResult = z.infer<typeof readingImportResultSchema>;
export const readingImportResultResponseSchema = z.object({ data: readingImportResultSchema });
export type ImportResultResponse = z.infer<typeof readingImportResultResponseSchema>;
