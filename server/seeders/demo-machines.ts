// Writes the demo's machines with their operators, generated readings, the one meter
// replacement (whose date goes into that machine's notes) and the one counter reset, then the
// meters beside the primary ones and the hitch log (demo-meter-writes.ts).
import type { Transaction } from 'sequelize';
import { Machine, MachineOperator, MeterReading, MeterReplacement } from '../models';
import { todayIso } from '../../shared/domain';
import { buildMachineReadings, type MachineReadings } from './demo-readings';
import { DEMO_MACHINES, METER_REPLACEMENT } from './demo-fleet';
import { DEMO_HITCHES } from './demo-hitch';
import { COUNTER_RESET } from './demo-meters';
import { buildHitchesAndMeters, writeHitchesAndMeters } from './demo-meter-writes';
import {
  demoMachineId as machineId,
  demoOrganization as orgOf,
  demoOrgId as orgId,
  demoStaff as staff,
  demoUserId as userId,
} from './demo-ids';

const CHUNK = 1000;

/** Writes rows in bulk inserts of at most CHUNK rows. */
export async function inChunks<T>(rows: T[], write: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) await write(rows.slice(i, i + CHUNK));
}

/** Writes every demo machine and its readings; returns each machine's readings by fleet number. */
export async function writeMachines(today: Date, transaction: Transaction) {
  // Readings first: the T-03 meter replacement goes into that machine's notes.
  const history = new Map<string, MachineReadings>();
  const onHitchLog = new Set(DEMO_HITCHES.map((h) => h.implement));
  for (const m of DEMO_MACHINES) {
    if (onHitchLog.has(m.fleetNumber)) continue;
    const operators = (m.operators ?? []).map(userId);
    history.set(
      m.fleetNumber,
      buildMachineReadings(m, {
        today,
        timeZone: orgOf(m.organization).timeZone,
        enteredBy: [...operators, ...operators, ...staff(m.organization, 'manager')],
        technician: staff(m.organization, 'technician')[0] ?? null,
        replaceDaysAgo:
          m.fleetNumber === METER_REPLACEMENT.fleetNumber ? METER_REPLACEMENT.daysAgo : undefined,
        reset: m.fleetNumber === COUNTER_RESET.fleetNumber ? COUNTER_RESET : undefined,
      }),
    );
  }
  // the implements on the hitch log take their readings from their tractors' extra meters
  const extras = buildHitchesAndMeters(history, today);

  await Machine.bulkCreate(
    DEMO_MACHINES.map((m) => {
      const replacement = history.get(m.fleetNumber)!.replacement;
      return {
        id: machineId(m),
        organizationId: orgId(m.organization),
        fleetNumber: m.fleetNumber,
        name: m.name,
        category: m.category,
        machineClass: m.machineClass,
        make: m.make,
        model: m.model,
        serialNumber: m.serialNumber,
        year: m.year,
        // the demo's prices are whole dollars; the farms count in cents
        purchasePriceMinor: m.purchasePrice * 100,
        listPriceMinor: m.listPrice * 100,
        meterUnit: m.meterUnit,
        seasonMonths: m.season.months,
        photoKey: null,
        notes:
          replacement?.kind === 'replacement'
            ? `Hour meter replaced ${todayIso(orgOf(m.organization).timeZone, replacement.replacedAt)}: the old meter stopped at ${replacement.oldFinalValue.toLocaleString('en-US')} h, the new one started at 0 h.`
            : '',
      };
    }),
    { transaction },
  );
  await MachineOperator.bulkCreate(
    DEMO_MACHINES.flatMap((m) =>
      (m.operators ?? []).map((email) => ({
        organizationId: orgId(m.organization),
        machineId: machineId(m),
        userId: userId(email),
      })),
    ),
    { transaction },
  );

  const replacements = DEMO_MACHINES.flatMap((m) => {
    const r = history.get(m.fleetNumber)!.replacement;
    return r ? [{ organizationId: orgId(m.organization), machineId: machineId(m), ...r }] : [];
  });
  await MeterReplacement.bulkCreate(replacements, { transaction });
  await writeHitchesAndMeters(extras, transaction);
  // readings without a meter id go on the machine's primary meter (migration 0026's trigger)
  const readingRows = [
    ...DEMO_MACHINES.flatMap((m) =>
      history.get(m.fleetNumber)!.readings.map((r) => ({
        organizationId: orgId(m.organization),
        machineId: machineId(m),
        importKey: null,
        updatedAt: r.createdAt,
        ...r,
      })),
    ),
    ...extras.readings.map(({ fleetNumber, ...r }) => {
      const m = DEMO_MACHINES.find((x) => x.fleetNumber === fleetNumber)!;
      return {
        organizationId: orgId(m.organization),
        machineId: machineId(m),
        importKey: null,
        updatedAt: r.createdAt,
        ...r,
      };
    }),
  ];
  await inChunks(readingRows, (chunk) =>
    MeterReading.bulkCreate(chunk, { transaction, returning: false }),
  );

  return { history, readingCount: readingRows.length };
}
