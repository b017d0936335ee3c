import { z } from 'zod';

export const email = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com' }));

export const password = z
  .string({ error: 'Enter a password' })
  .min(10, { error: 'Use at least 10 characters' })
  .max(200, { error: 'Use at most 200 characters' });

export const personName = z
  .string({ error: 'Enter a name' })
  .trim()
  .min(1, { error: 'Enter a name' })
  .max(120, { error: 'Use at most 120 characters' });

export const uuid = z.uuid({ error: 'Must be an id (uuid)' });

/** The `page` and `pageSize` query fields of every paged list (pageSize defaults to `size`, at most `max`). */
export const pagingFields = (size: number, max: number) => ({
  page: z.coerce
    .number({ error: 'Page must be a number' })
    .int({ error: 'Page must be a whole number' })
    .min(1, { error: 'Page starts at 1' })
    .default(1),
  pageSize: z.coerce
    .number({ error: 'Page size must be a number' })
    .int({ error: 'Page size must be a whole number' })
    .min(1, { error: 'Page size is at least 1' })
    .max(max, { error: `At most ${max} rows per page` })
    .default(size),
});
