// Changes of a meter itself: a replacement (a new meter fitted) or a counter reset (the same
// counter zeroed, e.g. a baler's bale counter). Both record the final value before and the start
// after, so lifetime values run on across them (shared/domain lifetime.ts), and add the two
// readings through the same rules as any other.
import { Op } from 'sequelize';
import { sequelize } from '../db';
import { AppError, invalid } from '../errors';
import { MachineMeter, MeterReading, MeterReplacement, type Machine } from '../models';
import { METER_KIND_LABELS, type MeterChangeKind } from '../../shared/constants';
import { isCountingMeter } from '../../shared/domain/meter-kinds';
import type { OrgAccess } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { lockMachineReadings } from './reading-neighbours';
import { writeReadings } from './readings';

/** The 404 of a meter id that is not one of the machine's meters, naming the field. */
export const meterNotFound = () =>
  new AppError(404, 'not_found', 'Meter not found on this machine', {
    meterId: 'No such meter on this machine',
  });

/** The 400 of a counter reset on a meter that is not zeroed in use (an hour meter, an odometer). */
const notACounter = (kind: MachineMeter['kind']) => {
  const message = `A counter reset is only for a counting meter (a bale counter); ${METER_KIND_LABELS[kind]} is not zeroed in use — record a meter replacement when a new meter is fitted`;
  return new AppError(400, 'invalid', `meterId: ${message}`, { meterId: message });
};

/** What a meter replacement or counter reset records. */
export interface MeterChangeInput {
  /** the machine's meter; left out, its primary meter */
  meterId?: string;
  oldFinalValue: number;
  newStartValue: number;
  replacedAt: Date;
  note: string;
}

/**
 * Records a meter replacement, or (kind 'reset') a counter zeroed on the same meter: the final
 * reading just before, the new start at the change's time; lifetime values stay continuous, so a
 * reset is no longer "going backwards". A meter id not on this machine is a 404 naming meterId.
 */
export async function replaceMeter(
  access: OrgAccess,
  machine: Machine,
  input: MeterChangeInput,
  kind: MeterChangeKind = 'replacement',
) {
  return sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    const meter = await MachineMeter.findOne({
      where: {
        organizationId: machine.organizationId,
        machineId: machine.id,
        ...(input.meterId ? { id: input.meterId } : { isPrimary: true }),
      },
      transaction,
    });
    if (!meter) throw meterNotFound();
    if (kind === 'reset' && !isCountingMeter(meter.kind)) throw notACounter(meter.kind);
    const later = await MeterReading.count({
      where: {
        organizationId: machine.organizationId,
        meterId: meter.id,
        takenAt: { [Op.gte]: input.replacedAt },
      },
      transaction,
    });
    if (later > 0) {
      throw invalid({
        replacedAt: `There are readings after this time; a ${kind === 'reset' ? 'counter reset' : 'replacement'} must come after the last reading`,
      });
    }
    const replacement = await MeterReplacement.create(
      {
        organizationId: machine.organizationId,
        machineId: machine.id,
        meterId: meter.id,
        kind,
        replacedAt: input.replacedAt,
        oldFinalValue: input.oldFinalValue,
        newStartValue: input.newStartValue,
        note: input.note,
        enteredBy: access.userId,
      },
      { transaction },
    );
    try {
      await writeReadings(
        access,
        [
          {
            machine,
            meterId: meter.id,
            value: input.oldFinalValue,
            takenAt: new Date(input.replacedAt.getTime() - 1000),
            source: 'manual',
          },
          {
            machine,
            meterId: meter.id,
            value: input.newStartValue,
            takenAt: input.replacedAt,
            source: 'manual',
          },
        ],
        transaction,
        { locked: true },
      );
    } catch (err) {
      if (err instanceof AppError && err.fields) {
        const message = Object.values(err.fields)[0];
        throw invalid({ oldFinalValue: message });
      }
      throw err;
    }
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: kind === 'reset' ? 'meter.reset' : 'meter.replace',
        entityType: 'meter_replacement',
        entityId: replacement.id,
        changes: {
          machineId: machine.id,
          ...input,
          meterId: meter.id,
          replacedAt: input.replacedAt.toISOString(),
        },
      },
      transaction,
    );
    return replacement;
  });
}
