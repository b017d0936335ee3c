import { parse } from 'csv-parse/sync';
import { TZDate } from '@date-fns/tz';
import { Op } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { planReadings, writeReadings, type NewReading } from './readings';

export interface ImportRow {
  line: number;
  fleetNumber: string;
  machine: { id: string; name: string; fleetNumber: string; meterUnit: string } | null;
  takenAt: string | null;
  value: number | null;
  status: 'new' | 'duplicate' | 'error';
  error: string | null;
}

const HEADER_ALIASES: Record<'fleetNumber' | 'takenAt' | 'value', string[]> = {
  fleetNumber: ['fleet number', 'fleet_number', 'fleetnumber', 'fleet no', 'fleet', 'machine'],
  takenAt: ['taken at', 'taken_at', 'takenat', 'date', 'time', 'datetime', 'timestamp'],
  value: ['value', 'reading', 'meter', 'hours', 'hour meter'],
};

/** The farm's local date order: month first for imperial (US) farms, day first otherwise. */
export const localDateOrder = (access: OrgAccess): 'mdy' | 'dmy' =>
  access.organization.units === 'imperial' ? 'mdy' : 'dmy';

/** Parses a date-time cell: ISO 8601 (with or without offset) or the farm's local d/m/y or m/d/y. */
export function parseTakenAt(cell: string, timeZone: string, order: 'mdy' | 'dmy'): Date | string {
  const s = cell.trim();
  const local = (y: number, mo: number, d: number, h = 12, mi = 0, sec = 0) => {
    if (mo < 1 || mo > 12 || d < 1 || d > 31 || h > 23 || mi > 59 || sec > 59) return null;
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
    return local(+y, +mo, +d, h ? +h : 12, mi ? +mi : 0, sec ? +sec : 0) ?? 'is not a valid date';
  }
  m = s.match(/^(\d{1,2})[/.](\d{1,2})[/.](\d{4})(?:[ T](\d{1,2}):(\d{2}))?$/);
  if (m) {
    const [, a, b, y, h, mi] = m;
    const [mo, d] = order === 'mdy' ? [+a, +b] : [+b, +a];
    return local(+y, mo, d, h ? +h : 12, mi ? +mi : 0) ?? 'is not a valid date';
  }
  const example = order === 'mdy' ? 'MM/DD/YYYY HH:mm' : 'DD/MM/YYYY HH:mm';
  return `must be an ISO date (2026-05-01 or 2026-05-01T07:30) or ${example}`;
}

function detectDelimiter(text: string): ',' | ';' {
  const header = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  return (header.match(/;/g)?.length ?? 0) > (header.match(/,/g)?.length ?? 0) ? ';' : ',';
}

/** Parses and checks a CSV of readings. Nothing is written. */
export async function analyseImport(access: OrgAccess, buffer: Buffer) {
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
    throw invalid({ file: 'The file is empty; it needs a header row and at least one reading' });
  const header = records[0].record.map((h) => h.toLowerCase().replace(/\s+/g, ' ').trim());
  const col = Object.fromEntries(
    Object.entries(HEADER_ALIASES).map(([key, aliases]) => [
      key,
      header.findIndex((h) => aliases.includes(h)),
    ]),
  ) as Record<keyof typeof HEADER_ALIASES, number>;
  const missing = Object.entries(col)
    .filter(([, i]) => i < 0)
    .map(([k]) => k);
  if (missing.length) {
    throw invalid({
      file: `The header row must name the columns fleet number, taken at and value (missing: ${missing.join(', ')})`,
    });
  }
  const dataRows = records.slice(1);
  if (!dataRows.length) throw invalid({ file: 'The file has a header row but no readings' });
  if (dataRows.length > 20_000) throw invalid({ file: 'At most 20,000 readings per file' });

  const fleetNumbers = [
    ...new Set(dataRows.map((r) => (r.record[col.fleetNumber] ?? '').toLowerCase())),
  ];
  const machines = await Machine.findAll({
    where: {
      organizationId: access.organization.id,
      [Op.and]: [
        sequelize.where(sequelize.fn('lower', sequelize.col('fleet_number')), {
          [Op.in]: fleetNumbers,
        }),
      ],
    },
  });
  const byFleet = new Map(machines.map((m) => [m.fleetNumber.toLowerCase(), m]));
  const order = localDateOrder(access);
  const rows: ImportRow[] = [];
  const candidates: { row: ImportRow; reading: NewReading }[] = [];
  for (const { record, info } of dataRows) {
    const fleetNumber = record[col.fleetNumber] ?? '';
    const machine = byFleet.get(fleetNumber.toLowerCase()) ?? null;
    const row: ImportRow = {
      line: info.lines,
      fleetNumber,
      machine: machine && {
        id: machine.id,
        name: machine.name,
        fleetNumber: machine.fleetNumber,
        meterUnit: machine.meterUnit,
      },
      takenAt: null,
      value: null,
      status: 'new',
      error: null,
    };
    rows.push(row);
    const fail = (msg: string) => {
      row.status = 'error';
      row.error = `Line ${row.line}: ${msg}`;
    };
    if (!fleetNumber) {
      fail('fleet number is empty');
      continue;
    }
    if (!machine) {
      fail(`fleet number "${fleetNumber}" is not a machine of this farm`);
      continue;
    }
    if (machine.status === 'sold') {
      fail(`${machine.fleetNumber} is sold; readings are closed`);
      continue;
    }
    const takenAt = parseTakenAt(record[col.takenAt] ?? '', access.organization.timeZone, order);
    if (typeof takenAt === 'string') {
      fail(`taken at "${record[col.takenAt] ?? ''}" ${takenAt}`);
      continue;
    }
    row.takenAt = takenAt.toISOString();
    let raw = (record[col.value] ?? '').replace(/\s/g, '');
    if (delimiter === ';' && /^\d+,\d+$/.test(raw)) raw = raw.replace(',', '.');
    const value = /^\d+(\.\d+)?$/.test(raw) ? Number(raw) : NaN;
    if (!Number.isFinite(value)) {
      fail(`value "${record[col.value] ?? ''}" must be a number like 1234.5`);
      continue;
    }
    row.value = value;
    candidates.push({ row, reading: { machine, value, takenAt, source: 'import' } });
  }
  return { rows, candidates };
}

const summarise = (rows: ImportRow[]) => ({
  total: rows.length,
  new: rows.filter((r) => r.status === 'new').length,
  duplicates: rows.filter((r) => r.status === 'duplicate').length,
  errors: rows.filter((r) => r.status === 'error').length,
});

/** Checks every row (parse errors and reading rules) inside a transaction that is rolled back. */
export async function previewImport(access: OrgAccess, buffer: Buffer) {
  const { rows, candidates } = await analyseImport(access, buffer);
  const transaction = await sequelize.transaction();
  try {
    const { outcomes, errors } = await planReadings(
      access,
      candidates.map((c) => c.reading),
      transaction,
      { fieldPrefix: (i) => `${i}.` },
    );
    for (const o of outcomes)
      if (o.status === 'duplicate') candidates[o.index].row.status = 'duplicate';
    for (const [key, message] of Object.entries(errors)) {
      const row = candidates[Number(key.split('.')[0])].row;
      row.status = 'error';
      row.error = `Line ${row.line}: ${message}`;
    }
  } finally {
    await transaction.rollback();
  }
  return { rows, summary: summarise(rows) };
}

/** Writes the whole file in one transaction, or nothing when any row is bad. */
export async function commitImport(access: OrgAccess, buffer: Buffer) {
  const preview = await previewImport(access, buffer);
  const bad = preview.rows.filter((r) => r.status === 'error');
  if (bad.length) {
    const err = invalid(
      Object.fromEntries(bad.map((r) => [`line ${r.line}`, r.error!])),
      `${bad.length} row${bad.length === 1 ? '' : 's'} cannot be imported; nothing was written`,
    );
    throw err;
  }
  const { candidates } = await analyseImport(access, buffer);
  const outcomes = await sequelize.transaction((transaction) =>
    writeReadings(
      access,
      candidates.map((c) => c.reading),
      transaction,
    ),
  );
  return {
    added: outcomes.filter((o) => o.status === 'added').length,
    duplicates: outcomes.filter((o) => o.status === 'duplicate').length,
    total: preview.rows.length,
  };
}
