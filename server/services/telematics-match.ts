// The machines a telematics post names, read and locked in one statement: every machine of the
// key's organization whose telematics id or serial number is among those sent, FOR UPDATE (the
// row lock every reading writer takes, in id order so two posts cannot deadlock), each with the
// meter engine hours go on: its engine-hours meter (migration 0026), else its primary one.
import type { Transaction } from 'sequelize';
import { directQuery } from '../db-direct';
import { instanceFrom } from '../infra/session-load';
import { Machine } from '../models';

/** A serial number as compared: trimmed, upper case (feeds and people type them differently). */
export const serialKey = (s: string) => s.trim().toUpperCase();

/** The meter a feed's engine hours are written to. */
export interface HoursMeter {
  id: string;
  unit: string;
}

export interface MachineIndex {
  byTelematicsId: Map<string, Machine>;
  bySerial: Map<string, Machine[]>;
  /** by machine id */
  meters: Map<string, HoursMeter>;
}

// The machine's engine-hours meter (the first), else its primary meter.
const HOURS_METER = `LEFT JOIN LATERAL (
    SELECT mm.id, mm.unit FROM machine_meters mm
    WHERE mm.machine_id = m.id AND mm.organization_id = m.organization_id
      AND (mm.kind = 'engine_hours' OR mm.is_primary)
    ORDER BY mm.kind = 'engine_hours' DESC, mm.position, mm.is_primary DESC LIMIT 1) mm ON true`;

interface Row {
  m: Record<string, unknown>;
  meter_id: string | null;
  meter_unit: string | null;
}

const meterOf = (row: Row): HoursMeter | null =>
  row.meter_id ? { id: row.meter_id, unit: row.meter_unit ?? '' } : null;

/** The organization's machines named by these ids (telematics ids, serials or PINs), locked. */
export async function lockMachinesNamed(
  organizationId: string,
  ids: string[],
  transaction: Transaction,
): Promise<MachineIndex> {
  const wanted = [...new Set(ids.filter(Boolean))];
  const rows = wanted.length
    ? await directQuery<Row>(
        transaction,
        `SELECT to_jsonb(m) AS m, mm.id AS meter_id, mm.unit AS meter_unit
         FROM machines m ${HOURS_METER}
         WHERE m.organization_id = $1
           AND (m.telematics_id = ANY($2::text[])
                OR (m.serial_number <> '' AND upper(btrim(m.serial_number)) = ANY($3::text[])))
         ORDER BY m.id FOR UPDATE OF m`,
        [organizationId, wanted, wanted.map(serialKey)],
      )
    : [];
  const index: MachineIndex = { byTelematicsId: new Map(), bySerial: new Map(), meters: new Map() };
  for (const row of rows) {
    const machine = instanceFrom(Machine, row.m);
    const meter = meterOf(row);
    if (meter) index.meters.set(machine.id, meter);
    if (machine.telematicsId) index.byTelematicsId.set(machine.telematicsId, machine);
    if (machine.serialNumber) {
      const key = serialKey(machine.serialNumber);
      index.bySerial.set(key, [...(index.bySerial.get(key) ?? []), machine]);
    }
  }
  return index;
}

/**
 * One machine by its id or telematics id, locked, with its hours meter; null when the
 * organization has none such.
 */
export async function lockMachineNamed(
  organizationId: string,
  ref: string,
  transaction: Transaction,
): Promise<{ machine: Machine; meter: HoursMeter | null } | null> {
  const isUuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(ref);
  const [row] = await directQuery<Row>(
    transaction,
    `SELECT to_jsonb(m) AS m, mm.id AS meter_id, mm.unit AS meter_unit
     FROM machines m ${HOURS_METER}
     WHERE m.organization_id = $1 AND (m.telematics_id = $2 ${isUuid ? 'OR m.id = $2::uuid' : ''})
     ORDER BY (m.telematics_id = $2) DESC LIMIT 1 FOR UPDATE OF m`,
    [organizationId, ref],
  );
  return row ? { machine: instanceFrom(Machine, row.m), meter: meterOf(row) } : null;
}
