import { z } from 'zod';
import { METER_KINDS, METER_UNITS } from '../constants';
import { boundedNumber, plainText } from './common';
import { lastReadingSchema, usageSchema } from './machines';

// A machine's meters (issue 13): engine hours, separator hours, PTO hours, a bale counter…, one
// of them primary. The kind fixes the unit; the label tells two meters of one kind apart.

const meterFields = {
  kind: z.enum(METER_KINDS, { error: `Meter kind must be one of: ${METER_KINDS.join(', ')}` }),
  label: plainText(60),
  position: boundedNumber('Position', { min: 0, max: 99, int: true }),
};

/** Add a meter: its kind, and a label when the machine has two of one kind. */
export const meterCreateSchema = z.object({
  kind: meterFields.kind,
  label: meterFields.label.default(''),
});
export type MeterCreateInput = z.infer<typeof meterCreateSchema>;

/** Rename or reorder a meter: only the fields sent (its kind stays, as its readings are in it). */
export const meterUpdateSchema = z
  .object({ label: meterFields.label, position: meterFields.position })
  .partial()
  .strict();
export type MeterUpdateInput = z.infer<typeof meterUpdateSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

export const machineMeterSchema = z
  .object({
    id: z.string(),
    machineId: z.string(),
    kind: z.enum(METER_KINDS),
    unit: z.enum(METER_UNITS),
    label: z.string(),
    isPrimary: z.boolean(),
    position: z.number(),
    lastReading: lastReadingSchema.nullable(),
    usage: usageSchema.nullable(),
    readingCount: z.number(),
    taskCount: z.number(),
  })
  .meta({ id: 'MachineMeter' });
export type MachineMeterJson = z.infer<typeof machineMeterSchema>;

/** What the caller may do with the machine's meters (the server still checks every time). */
export const meterAbilitiesSchema = z.object({ manage: z.boolean(), logReading: z.boolean() });

export const meterListResponseSchema = z.object({
  data: z.array(machineMeterSchema),
  abilities: meterAbilitiesSchema,
});
export type MeterList = z.infer<typeof meterListResponseSchema>;

export const meterResponseSchema = z.object({ data: machineMeterSchema });
export type MeterResponse = z.infer<typeof meterResponseSchema>;
