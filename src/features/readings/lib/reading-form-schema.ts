import { z } from 'zod';
import { counterResetSchema, readingCreateSchema } from '../../../../shared/schemas/readings';

/**
 * The reading form as typed: the server's value rule as is, and the time as the datetime-local
 * text of the farm's wall clock (empty = now). It becomes an ISO instant on submit.
 */
export const readingFormSchema = z.object({
  value: readingCreateSchema.shape.value,
  takenAt: z.string(),
});
export type ReadingFormValues = z.infer<typeof readingFormSchema>;

/**
 * A new reading as typed (issue 13): with several meters, which one (empty: the primary); with
 * "counter was reset", the count before the reset (the value is then the count it restarted
 * from, usually 0).
 */
export const newReadingFormSchema = readingFormSchema
  .extend({
    meterId: z.string(),
    reset: z.boolean(),
    oldFinalValue: counterResetSchema.shape.oldFinalValue.optional(),
  })
  .refine((v) => !v.reset || v.oldFinalValue !== undefined, {
    path: ['oldFinalValue'],
    error: 'Enter what the counter showed before it was reset',
  });
