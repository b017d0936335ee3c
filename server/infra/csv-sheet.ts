// Reading a spreadsheet saved as CSV, the same way for every import: a header row, commas or
// semicolons, a byte-order mark and CRLF line ends allowed, the farm's local date order, and a
// decimal comma on metric farms (or in any semicolon file).
import { parse } from 'csv-parse/sync';
import { TZDate } from '@date-fns/tz';
import { parseMeterNumber, type MeterNumber } from '../../shared/domain/meter-number';
import { invalid } from '../errors';
import type { OrgAccess } from '../policies/access';

export interface CsvSheet {
  delimiter: ',' | ';';
  /** header cells lower-cased, with runs of spaces made one */
  header: string[];
  /** the header as written, for messages */
  headerText: string[];
  /** data rows with the file line each starts on */
  rows: { record: string[]; line: number }[];
}

/** The farm's local date order: month first for imperial (US) farms, day first otherwise. */
export const localDateOrder = (access: OrgAccess): 'mdy' | 'dmy' =>
  access.organization.units === 'imperial' ? 'mdy' : 'dmy';

/** Whether "1234,5" means 1234.5: on metric farms, and in any file separated by semicolons. */
export const usesDecimalComma = (access: OrgAccess, delimiter: ',' | ';') =>
  delimiter === ';' || access.organization.units === 'metric';

/** Lower-case with single spaces: how a header cell is matched against the names we accept. */
export const normaliseHeader = (cell: string) => cell.toLowerCase().replace(/\s+/g, ' ').trim();

/** Semicolons when the header line has more of them than commas, else commas. */
export function detectDelimiter(text: string): ',' | ';' {
  const header = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  return (header.match(/;/g)?.length ?? 0) > (header.match(/,/g)?.length ?? 0) ? ';' : ',';
}

/**
 * Parses a CSV file into its header and data rows. Refuses (422 on `file`) a file that is not
 * readable CSV, is empty, has no data rows, or has more than maxRows of them; `what` names a
 * row in the messages ("reading", "machine").
 */
export function readCsvSheet(buffer: Buffer, what: string, maxRows: number): CsvSheet {
  const text = buffer.toString('utf8');
  const delimiter = detectDelimiter(text);
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, {
      bom: true,
      delimiter,
      skip_empty_lines: true,
      relax_column_count: true,
      trim: true,
      info: true,
    }) as unknown as typeof records;
  } catch (err) {
    throw invalid({ file: `The file is not readable CSV: ${(err as Error).message}` });
  }
  if (!records.length)
    throw invalid({ file: `The file is empty; it needs a header row and at least one ${what}` });
  const rows = records.slice(1).map((r) => ({ record: r.record, line: r.info.lines }));
  if (!rows.length) throw invalid({ file: `The file has a header row but no ${what}s` });
  if (rows.length > maxRows)
    throw invalid({ file: `At most ${maxRows.toLocaleString('en-US')} ${what}s per file` });
  return {
    delimiter,
    header: records[0].record.map(normaliseHeader),
    headerText: records[0].record,
    rows,
  };
}

/**
 * A number cell by the file's decimal mark (a comma on metric farms and in semicolon files), read
 * by the one meter-number rule of the client's fields (shared/domain/meter-number.ts): the number,
 * or the reason it is not one ("is not a number in this file: use a point for decimals (3118.5)").
 */
export const parseCsvNumber = (cell: string, decimalComma: boolean): MeterNumber =>
  parseMeterNumber(cell, decimalComma ? 'metric' : 'imperial', { where: 'in this file' });

/** The example of the farm's local date format, for messages and help. */
export const localDateExample = (order: 'mdy' | 'dmy') =>
  order === 'mdy' ? 'MM/DD/YYYY' : 'DD/MM/YYYY';

/** A date cell as an ISO date: ISO (2026-05-01) or the farm's local d/m/y or m/d/y. */
export function parseLocalDate(cell: string, order: 'mdy' | 'dmy'): string | { error: string } {
  const s = cell.trim();
  let y: number, mo: number, d: number;
  let m = s.match(/^(\d{4})-(\d{2})-(\d{2})$/);
  if (m) [y, mo, d] = [+m[1], +m[2], +m[3]];
  else if ((m = s.match(/^(\d{1,2})[/.](\d{1,2})[/.](\d{4})$/))) {
    y = +m[3];
    [mo, d] = order === 'mdy' ? [+m[1], +m[2]] : [+m[2], +m[1]];
  } else {
    return { error: `must be a date like 2026-05-01 or ${localDateExample(order)}` };
  }
  const date = new Date(Date.UTC(y, mo - 1, d));
  if (date.getUTCFullYear() !== y || date.getUTCMonth() !== mo - 1 || date.getUTCDate() !== d)
    return { error: 'is not a valid date' };
  return `${String(y).padStart(4, '0')}-${String(mo).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}

// Local day (y·10⁴ + m·100 + d) → the zone's UTC offset all that day, per time zone; null for a
// day whose offset changes (daylight saving). A file of 500,000 rows spans a few
// thousand days, so each day's offset is worked out once instead of a zone lookup per row.
const offsetsByZone = new Map<string, Map<number, number | null>>();
const MAX_CACHED_DAYS = 100_000;

/**
 * The UTC offset (ms, local minus UTC) of the whole local day y-mo-d in `timeZone`; null when it
 * changes during the day (then each time is converted on its own); undefined when the day does
 * not exist (31/02).
 */
function dayOffsetMs(timeZone: string, y: number, mo: number, d: number) {
  const midnightUtc = Date.UTC(y, mo - 1, d);
  const day = new Date(midnightUtc);
  if (day.getUTCFullYear() !== y || day.getUTCMonth() !== mo - 1 || day.getUTCDate() !== d)
    return undefined;
  let offsets = offsetsByZone.get(timeZone);
  if (!offsets) offsetsByZone.set(timeZone, (offsets = new Map()));
  const key = y * 10_000 + mo * 100 + d;
  const known = offsets.get(key);
  if (known !== undefined) return known;
  if (offsets.size >= MAX_CACHED_DAYS) offsets.clear();
  const start = midnightUtc - new TZDate(y, mo - 1, d, 0, 0, 0, timeZone).getTime();
  const lastSecond = midnightUtc + 86_399_000;
  const end = lastSecond - new TZDate(y, mo - 1, d, 23, 59, 59, timeZone).getTime();
  const offset = start === end ? start : null;
  offsets.set(key, offset);
  return offset;
}

/**
 * Parses a date-time cell: ISO 8601 (with or without offset) or the farm's local d/m/y or m/d/y.
 * A date alone is taken at `dateOnlyHour` o'clock farm time (midday unless told otherwise).
 */
export function parseTakenAt(
  cell: string,
  timeZone: string,
  order: 'mdy' | 'dmy',
  dateOnlyHour = 12,
): Date | string {
  const s = cell.trim();
  const local = (y: number, mo: number, d: number, h = dateOnlyHour, mi = 0, sec = 0) => {
    if (mo < 1 || mo > 12 || d < 1 || d > 31 || h > 23 || mi > 59 || sec > 59) return null;
    const offset = dayOffsetMs(timeZone, y, mo, d);
    if (offset === undefined) return null;
    if (offset !== null) return new Date(Date.UTC(y, mo - 1, d, h, mi, sec) - offset);
    const date = new TZDate(y, mo - 1, d, h, mi, sec, timeZone);
    // Reject dates that roll over (31/02) by checking the calendar fields survive.
    if (date.getFullYear() !== y || date.getMonth() !== mo - 1 || date.getDate() !== d) return null;
    return new Date(date.getTime());
  };
  let m = s.match(
    /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?)?\s*(Z|[+-]\d{2}:?\d{2})?$/i,
  );
  if (m) {
    const [, y, mo, d, h, mi, sec, zone] = m;
    if (zone) {
      const parsed = new Date(
        `${y}-${mo}-${d}T${h ?? '12'}:${mi ?? '00'}:${sec ?? '00'}${zone.length === 5 ? `${zone.slice(0, 3)}:${zone.slice(3)}` : zone}`,
      );
      return Number.isNaN(parsed.getTime()) ? 'is not a valid date' : parsed;
    }
    return (
      local(+y, +mo, +d, h ? +h : dateOnlyHour, mi ? +mi : 0, sec ? +sec : 0) ??
      'is not a valid date'
    );
  }
  m = s.match(/^(\d{1,2})[/.](\d{1,2})[/.](\d{4})(?:[ T](\d{1,2}):(\d{2}))?$/);
  if (m) {
    const [, a, b, y, h, mi] = m;
    const [mo, d] = order === 'mdy' ? [+a, +b] : [+b, +a];
    return local(+y, mo, d, h ? +h : dateOnlyHour, mi ? +mi : 0) ?? 'is not a valid date';
  }
  return `must be an ISO date (2026-05-01 or 2026-05-01T07:30) or ${localDateExample(order)} HH:mm`;
}
