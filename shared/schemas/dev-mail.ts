import { z } from 'zod';

// The local mail catcher's inbox (development and test only), as GET /dev/mail answers it.

export const caughtMailSchema = z
  .object({
    id: z.string(),
    from: z.string(),
    to: z.array(z.string()),
    subject: z.string(),
    date: z.string(),
    text: z.string(),
    html: z.string().nullable(),
  })
  .meta({ id: 'CaughtMail' });
export type CaughtMail = z.infer<typeof caughtMailSchema>;

export const caughtMailListResponseSchema = z.object({ data: z.array(caughtMailSchema) });
export type CaughtMailList = z.infer<typeof caughtMailListResponseSchema>;
