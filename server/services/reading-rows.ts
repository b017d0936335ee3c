// New readings written as one JSON parameter unpacked by jsonb_to_recordset (alone, or inside a
// reading post's one write statement, forecast-rows.ts); they come back as MeterReading instances
// carrying the stored values (numeric(14,2)), which the machine's summary must agree with.
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { MeterReading } from '../models';
import type { ReadingSource } from '../../shared/constants';

export interface ReadingRow {
  organizationId: string;
  machineId: string;
  meterId: string;
  value: number;
  lifetimeValue: number;
  takenAt: Date;
  source: ReadingSource;
  enteredBy: string | null;
  importKey: string | null;
}

const CHUNK = 1000;

/** INSERT of rows given as a JSON array parameter, returning them as MeterReading attributes. */
export const INSERT_READINGS_SQL = (param: string) => `INSERT INTO meter_readings
    (organization_id, machine_id, meter_id, value, lifetime_value, taken_at, source, entered_by,
     import_key)
  SELECT r."organizationId", r."machineId", r."meterId", r.value, r."lifetimeValue", r."takenAt", r.source,
    r."enteredBy", r."importKey"
  FROM jsonb_to_recordset(${param}::jsonb) AS r("organizationId" uuid, "machineId" uuid,
    "meterId" uuid, value numeric, "lifetimeValue" numeric, "takenAt" timestamptz, source text, "enteredBy" uuid,
    "importKey" text)
  RETURNING id, organization_id AS "organizationId", machine_id AS "machineId",
    meter_id AS "meterId", value,
    lifetime_value AS "lifetimeValue", taken_at AS "takenAt", source, entered_by AS "enteredBy",
    import_key AS "importKey", created_at AS "createdAt", updated_at AS "updatedAt"`;

// (meter, time, value) is the rows' unique key: returned rows are matched to those sent by it.
const keyOf = (meterId: string, takenAt: Date, value: number) =>
  `${meterId}|${takenAt.getTime()}|${value}`;

/** The stored readings (RETURNING rows) as MeterReading instances, in the order of `rows`. */
export function matchStored(rows: ReadingRow[], stored: Record<string, unknown>[]): MeterReading[] {
  const byKey = new Map(
    stored.map((s) => {
      const reading = MeterReading.build(
        { ...s, takenAt: new Date(s.takenAt as string) } as never,
        {
          isNewRecord: false,
          raw: true,
        },
      );
      return [keyOf(reading.meterId, reading.takenAt, reading.value), reading];
    }),
  );
  return rows.map((r) => {
    const reading = byKey.get(keyOf(r.meterId, r.takenAt, r.value));
    // a value the column rounded differently than planReadings did (asStoredValue) lands here
    if (!reading) throw new Error(`reading ${r.value} at ${r.takenAt.toISOString()} not returned`);
    return reading;
  });
}

/** Inserts the rows (a statement per thousand); the stored readings come back in their order. */
export async function insertReadingRows(
  rows: ReadingRow[],
  transaction: Transaction,
): Promise<MeterReading[]> {
  const out: MeterReading[] = [];
  for (let i = 0; i < rows.length; i += CHUNK) {
    const chunk = rows.slice(i, i + CHUNK);
    const stored = await sequelize.query<Record<string, unknown>>(INSERT_READINGS_SQL('$1'), {
      bind: [JSON.stringify(chunk)],
      type: QueryTypes.SELECT,
      transaction,
    });
    out.push(...matchStored(chunk, stored));
  }
  return out;
}
