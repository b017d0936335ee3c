// The machines a telematics post names, read and locked in one statement: every machine of the
// key's organization whose telematics id or serial number is among those sent, FOR UPDATE (the
// row lock every reading writer takes, in id order so two posts cannot deadlock).
import type { Transaction } from 'sequelize';
import { directQuery } from '../db-direct';
import { instanceFrom } from '../infra/session-load';
import { Machine } from '../models';

/** A serial number as compared: trimmed, upper case (feeds and people type them differently). */
export const serialKey = (s: string) => s.trim().toUpperCase();

export interface MachineIndex {
  byTelematicsId: Map<string, Machine>;
  bySerial: Map<string, Machine[]>;
}

/** The organization's machines named by these ids (telematics ids, serials or PINs), locked. */
export async function lockMachinesNamed(
  organizationId: string,
  ids: string[],
  transaction: Transaction,
): Promise<MachineIndex> {
  const wanted = [...new Set(ids.filter(Boolean))];
  const rows = wanted.length
    ? await directQuery<{ m: Record<string, unknown> }>(
        transaction,
        `SELECT to_jsonb(m) AS m FROM machines m
         WHERE m.organization_id = $1
           AND (m.telematics_id = ANY($2::text[])
                OR (m.serial_number <> '' AND upper(btrim(m.serial_number)) = ANY($3::text[])))
         ORDER BY m.id FOR UPDATE`,
        [organizationId, wanted, wanted.map(serialKey)],
      )
    : [];
  const index: MachineIndex = { byTelematicsId: new Map(), bySerial: new Map() };
  for (const { m } of rows) {
    const machine = instanceFrom(Machine, m);
    if (machine.telematicsId) index.byTelematicsId.set(machine.telematicsId, machine);
    if (machine.serialNumber) {
      const key = serialKey(machine.serialNumber);
      index.bySerial.set(key, [...(index.bySerial.get(key) ?? []), machine]);
    }
  }
  return index;
}

/** One machine by its id or telematics id, locked; null when the organization has none such. */
export async function lockMachineNamed(
  organizationId: string,
  ref: string,
  transaction: Transaction,
): Promise<Machine | null> {
  const isUuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(ref);
  const [row] = await directQuery<{ m: Record<string, unknown> }>(
    transaction,
    `SELECT to_jsonb(m) AS m FROM machines m
     WHERE m.organization_id = $1 AND (m.telematics_id = $2 ${isUuid ? 'OR m.id = $2::uuid' : ''})
     ORDER BY (m.telematics_id = $2) DESC LIMIT 1 FOR UPDATE`,
    [organizationId, ref],
  );
  return row ? instanceFrom(Machine, row.m) : null;
}
