import { z } from 'zod';
import { duePointSchema, lastReadingSchema } from './machine';

/** One row of the due list (GET …/due); reused by every response that carries due rows. */
export const dueRowSchema = z
  .object({
    taskId: z.string(),
    taskName: z.string(),
    hazards: z.array(z.string()),
    labourHours: z.number().nullable(),
    machine: z.object({
      id: z.string(),
      fleetNumber: z.string(),
      name: z.string(),
      category: z.string(),
      status: z.string(),
      meterUnit: z.string(),
    }),
    due: duePointSchema,
    lastReading: lastReadingSchema.nullable(),
    dueOnMeter: z
      .number()
      .nullable()
      .openapi({ description: 'the due value as the meter fitted now shows it' }),
    usage: z
      .object({ method: z.string(), rate: z.number(), low: z.number(), high: z.number() })
      .nullable(),
  })
  .openapi('DueRow');
