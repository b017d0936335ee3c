// What a telematics feed posts with an API key (issue 13): an ISO/TS 15143-3 fleet snapshot,
// each Equipment entry matched to a machine of the key's organization and turned into a reading
// (source 'telematics'); unknown equipment is reported back, never created. The fields relied on
// are listed in shared/schemas/telematics.ts.
import { sequelize } from '../db';
import type { Machine } from '../models';
import type { KeyContext } from '../policies/context';
import { readingsClosedMessage, takesReadings } from '../policies/machine';
import type {
  IsoSnapshot,
  SnapshotItem,
  SnapshotResult,
  TelematicsItemStatus,
} from '../../shared/schemas/telematics';
import {
  lockMachinesNamed,
  serialKey,
  type HoursMeter,
  type MachineIndex,
} from './telematics-match';
import { recordTelematicsReadings, type TelematicsReading } from './telematics-write';

type Header = IsoSnapshot['Fleet']['Equipment'][number]['EquipmentHeader'];

const named = (m: Machine) => `${m.fleetNumber} ${m.name}`;

/**
 * The machine an EquipmentHeader names: a mapped telematics id first (EquipmentID, else the
 * serial or PIN sent), then the serial number or PIN against machines' serial numbers. A serial
 * on two machines names neither.
 */
function matchHeader(h: Header, index: MachineIndex): { machine: Machine } | { reason: string } {
  for (const id of [h.EquipmentID, h.SerialNumber, h.PIN]) {
    const machine = id ? index.byTelematicsId.get(id) : undefined;
    if (machine) return { machine };
  }
  for (const serial of [h.SerialNumber, h.PIN]) {
    const found = serial ? index.bySerial.get(serialKey(serial)) : undefined;
    if (found?.length === 1) return { machine: found[0] };
    if (found && found.length > 1)
      return {
        reason: `Serial number ${serial} is on ${[...found]
          .sort((a, b) => a.fleetNumber.localeCompare(b.fleetNumber))
          .map(named)
          .join(' and ')}; give one of them this feed's EquipmentID as its telematics id`,
      };
  }
  return {
    reason: 'No machine of this farm has this serial number, PIN or telematics id',
  };
}

/** Why a matched machine takes no engine hours from a feed, if it does not. */
export function hoursRefusal(
  machine: Machine,
  meter: HoursMeter | null | undefined,
): string | null {
  if (!takesReadings(machine)) return readingsClosedMessage(named(machine));
  if (!meter || meter.unit !== 'h')
    return `${named(machine)} has no hour meter (it counts ${meter?.unit ?? machine.meterUnit}): engine hours cannot go on it`;
  return null;
}

const COUNT_NAMES: Record<TelematicsItemStatus, keyof SnapshotResult['counts']> = {
  recorded: 'recorded',
  already_there: 'alreadyThere',
  refused: 'refused',
  unknown_equipment: 'unknownEquipment',
  no_hours: 'noHours',
};

/** Matches and records a snapshot in one transaction; an answer for every Equipment entry. */
export async function ingestSnapshot(
  key: KeyContext,
  snapshot: IsoSnapshot,
): Promise<SnapshotResult> {
  const equipment = snapshot.Fleet.Equipment;
  const items: SnapshotItem[] = equipment.map(({ EquipmentHeader: h }, index) => ({
    index,
    serialNumber: h.SerialNumber ?? null,
    pin: h.PIN ?? null,
    equipmentId: h.EquipmentID ?? null,
    machineId: null,
    fleetNumber: null,
    status: 'unknown_equipment',
    reason: null,
  }));
  await sequelize.transaction(async (transaction) => {
    const ids = equipment.flatMap(({ EquipmentHeader: h }) =>
      [h.EquipmentID, h.SerialNumber, h.PIN].filter((v): v is string => Boolean(v)),
    );
    const index = await lockMachinesNamed(key.organization.id, ids, transaction);
    const readings: TelematicsReading[] = [];
    const placeOf: number[] = [];
    for (const [i, entry] of equipment.entries()) {
      const item = items[i];
      const match = matchHeader(entry.EquipmentHeader, index);
      if ('reason' in match) {
        item.reason = match.reason;
        continue;
      }
      item.machineId = match.machine.id;
      item.fleetNumber = match.machine.fleetNumber;
      const hours = entry.CumulativeOperatingHours;
      const meter = index.meters.get(match.machine.id);
      const refusal = hoursRefusal(match.machine, meter);
      if (!hours)
        Object.assign(item, { status: 'no_hours', reason: 'No CumulativeOperatingHours' });
      else if (refusal) Object.assign(item, { status: 'refused', reason: refusal });
      else {
        readings.push({
          machine: match.machine,
          meterId: meter!.id,
          value: hours.Hour,
          takenAt: new Date(hours.datetime),
        });
        placeOf.push(i);
      }
    }
    const outcomes = await recordTelematicsReadings(key, readings, transaction);
    outcomes.forEach((o, j) => {
      const item = items[placeOf[j]];
      item.status = o.status;
      item.reason = o.status === 'refused' ? o.reason : null;
    });
  });
  const counts = { recorded: 0, alreadyThere: 0, refused: 0, unknownEquipment: 0, noHours: 0 };
  for (const item of items) counts[COUNT_NAMES[item.status]]++;
  return { items, counts };
}
