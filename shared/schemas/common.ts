import { z } from 'zod';

// Building blocks of every request schema. Each field gets a range that fits its column and the
// trade, text refuses control characters (PostgreSQL refuses NUL in text and JSON outright), and
// dates have windows, so bad input is refused here with the field and the rule, never by the
// database with a 500.

const grouped = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 4 });

// C0 controls, DEL and C1 controls; multi-line text keeps tab and line feed (CR LF becomes LF).
// Matching control characters is the point of these two patterns.
// eslint-disable-next-line no-control-regex
const CONTROL_ONE_LINE = /^[^\u0000-\u001f\u007f-\u009f]*$/;
// eslint-disable-next-line no-control-regex
const CONTROL_MULTI_LINE = /^[^\u0000-\u0008\u000b-\u001f\u007f-\u009f]*$/;
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

interface TextOptions {
  /** the message when the text is missing or empty; without it the text may be empty */
  required?: string;
  /** line breaks and tabs allowed (notes, instructions) */
  multiline?: boolean;
  /** keep surrounding spaces (passwords, tokens) */
  untrimmed?: boolean;
}

/** Text of at most `max` characters without control characters (only \n and \t in multi-line). */
export function plainText(max: number, options: TextOptions = {}) {
  let s = z.string({ error: options.required ?? 'Must be text' });
  if (options.multiline) s = s.overwrite((v) => v.replace(/\r\n?/g, '\n'));
  if (!options.untrimmed) s = s.trim();
  if (options.required) s = s.min(1, { error: options.required });
  return s
    .max(max, { error: `Use at most ${grouped(max)} characters` })
    .regex(options.multiline ? CONTROL_MULTI_LINE : CONTROL_ONE_LINE, {
      error: options.multiline
        ? 'Remove control characters: only line breaks and tabs are allowed'
        : 'Remove control characters: line breaks, tabs and the like are not allowed here',
    })
    .refine((v) => !LONE_SURROGATE.test(v), { error: 'Text must be valid Unicode' });
}

/** A closed range of a number field, with its label for the messages. */
export interface NumberBounds {
  min: number;
  max: number;
  /** the minimum itself is refused (a strictly positive interval or quantity) */
  exclusiveMin?: boolean;
  /** whole numbers only */
  int?: boolean;
}

/** A number within `bounds` (which must fit the column that stores it), named by `label`. */
export function boundedNumber(label: string, bounds: NumberBounds) {
  let n = z.number({ error: `${label} must be a number` });
  if (bounds.int) n = n.int({ error: `${label} must be a whole number` });
  n = bounds.exclusiveMin
    ? n.gt(bounds.min, {
        error:
          bounds.min === 0
            ? `${label} must be greater than 0`
            : `${label} must be greater than ${grouped(bounds.min)}`,
      })
    : n.min(bounds.min, {
        error:
          bounds.min === 0
            ? `${label} may not be negative`
            : `${label} must be at least ${grouped(bounds.min)}`,
      });
  return n.max(bounds.max, { error: `${label} must be at most ${grouped(bounds.max)}` });
}

/** Where a date may fall: ISO dates (yyyy-mm-dd), or functions of today's date (UTC). */
export interface DateWindow {
  from: string | ((today: string) => string);
  to: string | ((today: string) => string);
  /** the rule in words, after the field's label: "may not be before 1950-01-01 nor in the future" */
  says: (from: string, to: string) => string;
}

const todayUtc = () => new Date().toISOString().slice(0, 10);

/** The ISO date `days` days (or `years` years) away from `iso`. */
export function shiftIsoDate(
  iso: string,
  { days = 0, years = 0 }: { days?: number; years?: number },
) {
  const [y, m, d] = iso.split('-').map(Number);
  const at = new Date(Date.UTC(y + years, m - 1, d + days));
  return at.toISOString().slice(0, 10);
}

const bound = (b: DateWindow['from'], today: string) => (typeof b === 'string' ? b : b(today));

/** Dates of things that happened: from 1950 up to today (a day of slack for time zones ahead of UTC). */
export const PAST_DATES: DateWindow = {
  from: '1950-01-01',
  to: (today) => shiftIsoDate(today, { days: 1 }),
  says: (from) => `may not be before ${from} nor in the future`,
};

/** Dates of plans and bookings: within two years back and five years ahead of today. */
export const PLAN_DATES: DateWindow = {
  from: (today) => shiftIsoDate(today, { years: -2 }),
  to: (today) => shiftIsoDate(today, { years: 5 }),
  says: (from, to) => `must be between ${from} and ${to}`,
};

/** Dates a list may be asked about (a week, a filter): any year PostgreSQL and people agree on. */
export const CALENDAR_DATES: DateWindow = {
  from: '1950-01-01',
  to: '2199-12-31',
  says: (from, to) => `must be between ${from} and ${to}`,
};

function inWindow(date: string, window: DateWindow) {
  const today = todayUtc();
  const from = bound(window.from, today);
  const to = bound(window.to, today);
  return { ok: date >= from && date <= to, rule: window.says(from, to) };
}

/** A calendar date, yyyy-mm-dd, that exists (no 2026-02-30) and lies in `window`. */
export function isoDate(label: string, window: DateWindow) {
  return z.iso.date({ error: `${label} must be a real date, yyyy-mm-dd` }).superRefine((v, ctx) => {
    const { ok, rule } = inWindow(v, window);
    if (!ok) ctx.addIssue({ code: 'custom', message: `${label} ${rule}` });
  });
}

/** An ISO date-time with its offset whose UTC date lies in `window`. */
export function isoDateTime(label: string, window: DateWindow) {
  return z.iso
    .datetime({
      offset: true,
      error: `${label} must be an ISO date-time, like 2026-05-01T07:30:00-05:00`,
    })
    .superRefine((v, ctx) => {
      const ms = Date.parse(v);
      const { ok, rule } = Number.isNaN(ms)
        ? { ok: false, rule: 'must be a real date and time' }
        : inWindow(new Date(ms).toISOString().slice(0, 10), window);
      if (!ok) ctx.addIssue({ code: 'custom', message: `${label} ${rule}` });
    });
}

export const email = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com' }).max(254));

export const password = z
  .string({ error: 'Enter a password' })
  .min(10, { error: 'Use at least 10 characters' })
  .max(200, { error: 'Use at most 200 characters' });

export const personName = plainText(120, { required: 'Enter a name' });

export const uuid = z.uuid({ error: 'Must be an id (uuid)' });

/** Deepest page a list may be asked for (keeps OFFSET within what PostgreSQL takes). */
export const MAX_PAGE = 100_000;

/** The `page` and `pageSize` query fields of every paged list (pageSize defaults to `size`, at most `max`). */
export const pagingFields = (size: number, max: number) => ({
  page: z.coerce
    .number({ error: 'Page must be a number' })
    .int({ error: 'Page must be a whole number' })
    .min(1, { error: 'Page starts at 1' })
    .max(MAX_PAGE, { error: `Page is at most ${grouped(MAX_PAGE)}` })
    .default(1),
  pageSize: z.coerce
    .number({ error: 'Page size must be a number' })
    .int({ error: 'Page size must be a whole number' })
    .min(1, { error: 'Page size is at least 1' })
    .max(max, { error: `At most ${max} rows per page` })
    .default(size),
});
