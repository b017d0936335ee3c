// First stage of a reading import: the upload read as it arrives, each row turned into a machine,
// an instant and a meter value (or the reason it cannot be, by line and field) and kept in typed
// columns. The farm's machines are loaded once beforehand, so no row waits on the database.
import type { Request } from 'express';
import { meterNumberMessage } from '../../shared/domain/meter-number';
import { METER_BOUNDS, READING_IMPORT_LIMITS } from '../../shared/schemas/readings';
import { invalid } from '../errors';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { localDateOrder, parseCsvNumber, parseTakenAt, usesDecimalComma } from '../infra/csv-sheet';
import { streamCsvUpload, type CsvHeader, type CsvUploadInfo } from '../infra/csv-upload';
import {
  ErrorList,
  ReadingColumns,
  STATUS_ERROR,
  STATUS_NEW,
  type ImportMachine,
} from './reading-import-rows';

const HEADER_ALIASES: Record<'fleetNumber' | 'takenAt' | 'value', string[]> = {
  fleetNumber: ['fleet number', 'fleet_number', 'fleetnumber', 'fleet no', 'fleet', 'machine'],
  takenAt: ['taken at', 'taken_at', 'takenat', 'date', 'time', 'datetime', 'timestamp'],
  value: ['value', 'reading', 'meter', 'hours', 'hour meter'],
};
type Column = keyof typeof HEADER_ALIASES;

export interface ParsedImport {
  upload: CsvUploadInfo;
  rows: ReadingColumns;
  errors: ErrorList;
  /** the farm's machines; rows refer to them by index */
  machines: ImportMachine[];
}

/** Which column holds what; refuses a header that lacks one of them. */
function columnsOf({ header }: CsvHeader): Record<Column, number> {
  const col = Object.fromEntries(
    Object.entries(HEADER_ALIASES).map(([key, aliases]) => [
      key,
      header.findIndex((h) => aliases.includes(h)),
    ]),
  ) as Record<Column, number>;
  const missing = Object.entries(col)
    .filter(([, i]) => i < 0)
    .map(([k]) => k);
  if (missing.length) {
    throw invalid({
      file: `The header row must name the columns fleet number, taken at and value (missing: ${missing.join(', ')})`,
    });
  }
  return col;
}

/** Fleet number cell → machine index (-1: none), remembered for the cells a file repeats. */
function fleetLookup(machines: ImportMachine[]) {
  const byLower = new Map(machines.map((m, i) => [m.fleetNumber.toLowerCase(), i]));
  const seen = new Map<string, number>();
  return (cell: string) => {
    let i = seen.get(cell);
    if (i === undefined) {
      i = byLower.get(cell.toLowerCase()) ?? -1;
      if (seen.size < 50_000) seen.set(cell, i);
    }
    return i;
  };
}

/** Reads the uploaded CSV of readings into columns; nothing is written. */
export async function readImportUpload(access: OrgAccess, req: Request): Promise<ParsedImport> {
  const machines: ImportMachine[] = await Machine.findAll({
    where: { organizationId: access.organization.id },
    attributes: ['id', 'name', 'fleetNumber', 'meterUnit', 'status', 'organizationId'],
  });
  const machineOf = fleetLookup(machines);
  const rows = new ReadingColumns();
  const errors = new ErrorList();
  const timeZone = access.organization.timeZone;
  const order = localDateOrder(access);
  let col: Record<Column, number>;
  let decimalComma = false;

  const upload = await streamCsvUpload(
    req,
    { field: 'file', ...READING_IMPORT_LIMITS, what: 'reading' },
    {
      header(header) {
        col = columnsOf(header);
        decimalComma = usesDecimalComma(access, header.delimiter);
      },
      row(record, line) {
        const fleetNumber = record[col.fleetNumber] ?? '';
        const m = fleetNumber ? machineOf(fleetNumber) : -1;
        const fail = (message: string) => {
          const row = rows.push(m, Number.NaN, Number.NaN, line, STATUS_ERROR);
          errors.add({ row, line, message: `Line ${line}: ${message}`, fleetNumber });
        };
        if (!fleetNumber) return fail('fleet number is empty');
        if (m < 0) return fail(`fleet number "${fleetNumber}" is not a machine of this farm`);
        const machine = machines[m];
        if (machine.status === 'sold')
          return fail(`${machine.fleetNumber} is sold; readings are closed`);
        const takenAtCell = record[col.takenAt] ?? '';
        const takenAt = parseTakenAt(takenAtCell, timeZone, order);
        if (typeof takenAt === 'string') return fail(`taken at "${takenAtCell}" ${takenAt}`);
        const valueCell = record[col.value] ?? '';
        const number = parseCsvNumber(valueCell, decimalComma);
        if (!number.ok) {
          const row = rows.push(m, takenAt.getTime(), Number.NaN, line, STATUS_ERROR);
          const message = `Line ${line}: value ${meterNumberMessage(valueCell, number)}`;
          return errors.add({ row, line, message, fleetNumber });
        }
        if (number.value > METER_BOUNDS.max) {
          const row = rows.push(m, takenAt.getTime(), Number.NaN, line, STATUS_ERROR);
          const message = `Line ${line}: value "${valueCell}" is above ${METER_BOUNDS.max.toLocaleString('en-US')}, the most a meter value may be`;
          return errors.add({ row, line, message, fleetNumber });
        }
        // to the hundredth meter_readings keeps, so a resent row matches the one stored
        rows.push(m, takenAt.getTime(), Math.round(number.value * 100) / 100, line, STATUS_NEW);
      },
    },
  );
  return { upload, rows, errors, machines };
}
