// First stage of a reading import: the upload read as it arrives, each row turned into a machine's
// meter (the one an optional meter column names by kind, else the primary), an instant and a
// meter value (or the reason it cannot be, by line and field) and kept in typed columns. The
// farm's machines and meters are loaded once beforehand, so no row waits on the database.
import type { Request } from 'express';
import { meterNumberMessage } from '../../shared/domain/meter-number';
import { METER_BOUNDS, READING_IMPORT_LIMITS } from '../../shared/schemas/readings';
import { invalid } from '../errors';
import { Machine, MachineMeter } from '../models';
import { METER_KIND_LABELS, METER_KINDS, type MeterKind } from '../../shared/constants';
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
/** The optional column naming which meter a row is of (its kind); without it, the primary. */
const METER_COLUMN = ['meter kind', 'meter_kind', 'meterkind', 'kind'];

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

/** A meter kind as a cell may write it: its key (pto_hours) or its label (PTO hours), any case. */
function kindOfCell(cell: string): MeterKind | null {
  const text = cell
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
  return (
    METER_KINDS.find(
      (k) => k === text || METER_KIND_LABELS[k].toLowerCase().replace(/[\s-]+/g, '_') === text,
    ) ?? null
  );
}

/**
 * (Fleet number, meter kind) cells → meter index (-1: no such machine, -2: no such meter on it),
 * remembered for the cells a file repeats; an empty kind is the machine's primary meter.
 */
function meterLookup(meters: ImportMachine[]) {
  const byKey = new Map<string, number>();
  for (const [i, m] of meters.entries()) {
    const fleet = m.fleetNumber.toLowerCase();
    byKey.set(`${fleet}|${m.meterKind}`, byKey.get(`${fleet}|${m.meterKind}`) ?? i);
    if (m.isPrimary) byKey.set(`${fleet}|`, i);
  }
  const seen = new Map<string, number>();
  return (fleetCell: string, kindCell: string) => {
    const cell = `${fleetCell}|${kindCell}`;
    let i = seen.get(cell);
    if (i === undefined) {
      const fleet = fleetCell.toLowerCase();
      const kind = kindCell.trim() ? kindOfCell(kindCell) : '';
      i = byKey.get(`${fleet}|${kind ?? '?'}`) ?? (byKey.has(`${fleet}|`) ? -2 : -1);
      if (seen.size < 50_000) seen.set(cell, i);
    }
    return i;
  };
}

/** Every meter of the farm's machines with its machine, the primary first. */
async function farmMeters(organizationId: string): Promise<ImportMachine[]> {
  const rows = await MachineMeter.findAll({
    where: { organizationId },
    include: [
      {
        model: Machine,
        as: 'machine',
        attributes: ['id', 'name', 'fleetNumber', 'status', 'organizationId'],
      },
    ],
    order: [
      ['isPrimary', 'DESC'],
      ['position', 'ASC'],
    ],
  });
  return rows.map((meter) => {
    const m = (meter as MachineMeter & { machine: Machine }).machine;
    return {
      id: m.id,
      name: m.name,
      fleetNumber: m.fleetNumber,
      status: m.status,
      organizationId: m.organizationId,
      meterUnit: meter.unit,
      meterId: meter.id,
      meterKind: meter.kind,
      isPrimary: meter.isPrimary,
    };
  });
}

/** Reads the uploaded CSV of readings into columns; nothing is written. */
export async function readImportUpload(access: OrgAccess, req: Request): Promise<ParsedImport> {
  const machines = await farmMeters(access.organization.id);
  const meterOf = meterLookup(machines);
  let kindColumn = -1;
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
        kindColumn = header.header.findIndex((h) => METER_COLUMN.includes(h));
        decimalComma = usesDecimalComma(access, header.delimiter);
      },
      row(record, line) {
        const fleetNumber = record[col.fleetNumber] ?? '';
        const kindCell = kindColumn < 0 ? '' : (record[kindColumn] ?? '');
        const m = fleetNumber ? meterOf(fleetNumber, kindCell) : -1;
        const fail = (message: string) => {
          const row = rows.push(m, Number.NaN, Number.NaN, line, STATUS_ERROR);
          errors.add({ row, line, message: `Line ${line}: ${message}`, fleetNumber });
        };
        if (!fleetNumber) return fail('fleet number is empty');
        if (m === -2) {
          const kinds = machines
            .filter((t) => t.fleetNumber.toLowerCase() === fleetNumber.toLowerCase())
            .map((t) => METER_KIND_LABELS[t.meterKind]);
          return fail(
            `meter kind "${kindCell}" is not a meter of ${fleetNumber} (its meters: ${kinds.join(', ')})`,
          );
        }
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
