import { z } from 'zod';
import { readingCreateSchema } from '../../../../shared/schemas/readings';

/**
 * The reading form as typed: the server's value rule as is, and the time as the datetime-local
 * text of the farm's wall clock (empty = now). It becomes an ISO instant on submit.
 */
export const readingFormSchema = z.object({
  value: readingCreateSchema.shape.value,
  takenAt: z.string(),
});
export type ReadingFormValues = z.infer<typeof readingFormSchema>;
