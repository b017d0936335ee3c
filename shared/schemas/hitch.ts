import { z } from 'zod';
import { isoDateTime, PAST_DATES, plainText, uuid } from './common';

/** The tractor meters an implement may count its hours from (migration 0028 allows no other). */
export const HITCH_METER_KINDS = ['engine_hours', 'pto_hours'] as const;
export type HitchMeterKind = (typeof HITCH_METER_KINDS)[number];
export const HITCH_METER_KIND_LABELS: Record<HitchMeterKind, string> = {
  engine_hours: "the tractor's engine hours",
  pto_hours: "the tractor's PTO hours",
};

/** What may pull (a tractor) and what may be pulled on the hitch log, by machine category. */
export const HITCH_TRACTOR_CATEGORIES = ['tractor'] as const;
export const HITCH_IMPLEMENT_CATEGORIES = ['implement', 'mower', 'baler'] as const;

const spanFields = {
  tractorId: uuid,
  meterKind: z.enum(HITCH_METER_KINDS, {
    error: `Meter must be one of: ${HITCH_METER_KINDS.join(', ')}`,
  }),
  startedAt: isoDateTime('Hitched at', PAST_DATES),
  endedAt: isoDateTime('Unhitched at', PAST_DATES).nullable(),
  note: plainText(500, { multiline: true }),
};

const endAfterStart = (v: { startedAt?: string; endedAt?: string | null }) =>
  !v.startedAt || !v.endedAt || Date.parse(v.endedAt) > Date.parse(v.startedAt);
const END_RULE = { error: 'Unhitched at must be after Hitched at', path: ['endedAt'] };

/**
 * Hitching an implement to a tractor: now unless `startedAt` is given; with `endedAt` the span is
 * recorded whole (a day's work entered afterwards).
 */
export const hitchSpanCreateSchema = z
  .object({
    implementId: uuid,
    ...spanFields,
    meterKind: spanFields.meterKind.default('engine_hours'),
    startedAt: spanFields.startedAt.optional(),
    endedAt: spanFields.endedAt.optional(),
    note: spanFields.note.default(''),
  })
  .strict()
  .refine(endAfterStart, END_RULE);
export type HitchSpanCreateInput = z.infer<typeof hitchSpanCreateSchema>;

/** Unhitching: now unless `endedAt` is given. */
export const hitchSpanEndSchema = z
  .object({ endedAt: spanFields.endedAt.unwrap().optional() })
  .strict();
export type HitchSpanEndInput = z.infer<typeof hitchSpanEndSchema>;

/** A correction of a span: only the fields sent change (`endedAt: null` opens it again). */
export const hitchSpanUpdateSchema = z
  .object(spanFields)
  .partial()
  .strict()
  .refine(endAfterStart, END_RULE);
export type HitchSpanUpdateInput = z.infer<typeof hitchSpanUpdateSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

const machineRefSchema = z.object({ id: z.string(), fleetNumber: z.string(), name: z.string() });

export const hitchSpanSchema = z
  .object({
    id: z.string(),
    implement: machineRefSchema,
    tractor: machineRefSchema,
    meterKind: z.enum(HITCH_METER_KINDS),
    startedAt: z.string(),
    /** null: still hitched */
    endedAt: z.string().nullable(),
    note: z.string(),
    /** who entered it; null once that account is gone */
    enteredBy: z.string().nullable(),
    /** hours the implement gained in this span (to the tractor's last reading while open) */
    hours: z.number(),
  })
  .meta({ id: 'HitchSpan' });
export type HitchSpan = z.infer<typeof hitchSpanSchema>;

export const hitchLogSchema = z
  .object({
    /** spans where the machine is the implement or the tractor, newest first */
    spans: z.array(hitchSpanSchema),
    /** the implement's hours from hitching, all spans (0 for a tractor) */
    hitchHours: z.number(),
    abilities: z.object({ start: z.boolean(), correct: z.boolean() }),
  })
  .meta({ id: 'HitchLog' });
export type HitchLog = z.infer<typeof hitchLogSchema>;

export const hitchLogResponseSchema = z.object({ data: hitchLogSchema });
export const hitchSpanResponseSchema = z.object({ data: hitchSpanSchema });
