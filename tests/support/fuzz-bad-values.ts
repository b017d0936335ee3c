// The bad values the fuzz puts into bodies (tests/support/fuzz-arbitraries.ts), by kind: each
// one has broken something somewhere (a number past its column, NUL in text, the year 0000).

/** Anything in place of any field: wrong types, empty values, the largest double. */
// prettier-ignore
export const GENERIC_BAD: unknown[] = [null, true, false, 0, -1, '', 'x', [], {}, [null], { a: 1 }, 1e308];

/** Numbers past integer and numeric columns, tiny and fractional ones, numbers as text. */
// prettier-ignore
export const BAD_NUMBERS: unknown[] = [
  1e308, -1e308, 2 ** 31, 2 ** 31 - 1, -(2 ** 31), 2 ** 53, 2 ** 53 + 2, 1e15, 1e12, 1e10, 10_001,
  9_999.999, 0.001, -0.001, 5e-324, 1.5, '1', '1e3', '',
];

/** Control characters, lone surrogates, line and paragraph separators, injection-shaped text. */
// prettier-ignore
export const BAD_TEXT: string[] = [
  '\u0000', 'a\u0000b', '\u0007', '\u001b[31mred', '\u007f', '\u0085', '\ud800', 'x\udfff',
  '\u2028', '\ufeff', '\r', 'a\r\nb', '   ', "'; DROP TABLE machines; --", '{{7*7}}', '%_\\',
];

/** Dates that do not exist, lie outside any sane window, or are not yyyy-mm-dd. */
// prettier-ignore
export const BAD_DATES: string[] = [
  '0000-01-01', '2026-02-30', '2025-02-29', '9999-12-31', '1900-01-01', '1949-12-31',
  '2026-13-01', '2026-1-1', '20260101', '-0001-01-01', '+275760-09-13', 'today',
];

/** Date-times of the same kinds, and without their offset. */
// prettier-ignore
export const BAD_DATE_TIMES: string[] = [
  '0000-01-01T00:00:00Z', '9999-12-31T23:59:59Z', '1949-12-31T23:59:59Z', '2026-02-30T00:00:00Z',
  '2026-01-01T24:00:00Z', '2026-01-01T00:00:00+25:00', '2026-01-01T00:00:00',
  '+275760-09-13T00:00:00Z', '2999-01-01T00:00:00Z',
];

/** Ids that are no ids, or the nil id. */
export const BAD_IDS: string[] = ['not-a-uuid', '00000000-0000-0000-0000-000000000000', '1'];

/** E-mail addresses that are not, or are too long, or carry NUL. */
export const BAD_EMAILS: string[] = ['x@', `${'a'.repeat(300)}@example.com`, 'a\u0000@example.com'];

/** Whole bodies that are not a JSON object: malformed, scalar, deeply nested, NaN, 1e999. */
// prettier-ignore
export const RAW_JUNK: string[] = [
  '{"a":', '{"a": 1,}', 'null', '"text"', '12', '[]', `${'['.repeat(5000)}${']'.repeat(5000)}`,
  '{"value": NaN}', '{"value": 1e999}', '\u0000',
];
