import { Op } from 'sequelize';
import { meterNumberMessage } from '../../shared/domain/meter-number';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import {
  localDateOrder,
  parseCsvNumber,
  parseTakenAt,
  readCsvSheet,
  usesDecimalComma,
} from '../infra/csv-sheet';
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

/** Parses and checks a CSV of readings. Nothing is written. */
export async function analyseImport(access: OrgAccess, buffer: Buffer) {
  const { delimiter, header, rows: dataRows } = readCsvSheet(buffer, 'reading', 20_000);
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
  const decimalComma = usesDecimalComma(access, delimiter);
  for (const { record, line } of dataRows) {
    const fleetNumber = record[col.fleetNumber] ?? '';
    const machine = byFleet.get(fleetNumber.toLowerCase()) ?? null;
    const row: ImportRow = {
      line,
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
    const number = parseCsvNumber(record[col.value] ?? '', decimalComma);
    if (!number.ok) {
      fail(`value ${meterNumberMessage(record[col.value] ?? '', number)}`);
      continue;
    }
    const value = number.value;
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
