import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError } from '../errors';
import { Defect, Machine, Walkaround, WalkaroundPhoto } from '../models';
import { primaryForecastOf } from './primary-forecast';
import type { WalkaroundCreateInput, WalkaroundPurpose } from '../../shared/schemas/walkarounds';
import type { OrgAccess } from '../policies/access';
import { authorize, hasRole } from '../policies/access';
import { canDoWalkaround, canInspect } from '../policies/walkaround';
import { loadMachine } from './machines';
import { writeAccompanyingReading } from './readings';
import { raiseDefect, taggedOutMessage } from './defects';
import { recordAudit } from '../infra/audit';
import { checklistFor } from './checklist-templates';
import { checkAnswers } from './walkaround-answers';
import { checkCareDone, dailyCareOf, planCare, signOffCare } from './daily-care';
import { todayIso } from '../../shared/domain';

// Starting and submitting a walkaround; checklists are in checklist-templates.ts, photos in
// walkaround-photos.ts, the list and one walkaround in walkaround-history.ts.

/**
 * Why a walkaround may not start on this machine for this purpose, or null. An operator's check
 * before use is refused on a tagged-out machine, in the words the operator must see.
 */
export function walkaroundRefusal(machine: Machine, purpose: WalkaroundPurpose): AppError | null {
  if (machine.status === 'sold')
    return new AppError(
      409,
      'machine_sold',
      `${machine.fleetNumber} is sold; walkarounds are closed`,
    );
  if (purpose === 'use' && machine.status === 'tagged_out')
    return new AppError(409, 'tagged_out', taggedOutMessage(machine));
  return null;
}

/**
 * The machine a walkaround is for, as loadMachine finds it (404 when the caller may not see it).
 * An operator who scanned the label of their own farm's machine that is assigned to others is
 * told so (still a 404, code not_assigned): only its fleet number, which is on the label.
 */
export async function loadMachineToWalk(access: OrgAccess, machineId: string) {
  try {
    return await loadMachine(access, machineId);
  } catch (error) {
    if (!(error instanceof AppError) || error.status !== 404 || !hasRole(access, 'operator'))
      throw error;
    const machine = await Machine.findOne({
      where: { id: machineId, organizationId: access.organization.id },
      attributes: ['id', 'fleetNumber', 'status'],
    });
    if (!machine || machine.status === 'sold') throw error;
    throw new AppError(
      404,
      'not_assigned',
      `${machine.fleetNumber} is not assigned to you: it is assigned to other operators`,
    );
  }
}

/** Checks who may start which walkaround on the machine; throws 403 or 409. */
export function assertMayStart(access: OrgAccess, machine: Machine, purpose: WalkaroundPurpose) {
  authorize(canDoWalkaround(access, machine), 'Your role does not do walkarounds');
  if (purpose === 'inspection')
    authorize(canInspect(access), 'Only a technician or manager records a shop inspection');
  const refusal = walkaroundRefusal(machine, purpose);
  if (refusal) throw refusal;
}

/** What a walkaround starts from: the machine's checklist and its last reading, if any. */
export async function walkaroundStart(access: OrgAccess, machine: Machine) {
  const [checklist, forecast] = await Promise.all([
    checklistFor(access, machine),
    primaryForecastOf(machine),
  ]);
  // the value the meter shows (after a replacement or a counter reset, not the lifetime value):
  // the operator reads the meter and types what it shows
  const lastReading =
    forecast?.lastValue != null && forecast.lastTakenAt
      ? { value: forecast.lastRawValue ?? forecast.lastValue, takenAt: forecast.lastTakenAt }
      : null;
  const { id: orgId, timeZone } = access.organization;
  const dailyCare = (await dailyCareOf(orgId, timeZone, [machine.id])).get(machine.id) ?? [];
  return { checklist, lastReading, dailyCare };
}

export interface WalkaroundOutcome {
  walkaround: Walkaround;
  machine: Machine;
  created: boolean;
  defectIds: string[];
}

/**
 * Records a walkaround in one transaction: the meter reading (source 'walkaround', the usual
 * rules), the answers, a defect for each fail or attention, and a tag-out for a critical fail.
 * A clientId already used answers the first walkaround again, so a re-sent phone form is not doubled.
 */
async function saveWalkaround(
  access: OrgAccess,
  input: WalkaroundCreateInput,
): Promise<WalkaroundOutcome> {
  const again = await findByClientId(access, input);
  if (again) return again;
  try {
    return await sequelize.transaction(async (transaction) => {
      const { machine } = await loadMachine(access, input.machineId, transaction);
      await sequelize.query('SELECT id FROM machines WHERE id = :id FOR UPDATE', {
        replacements: { id: machine.id },
        transaction,
      });
      await machine.reload({ transaction });
      assertMayStart(access, machine, input.purpose);
      const checklist = await checklistFor(access, machine, transaction);
      const items = await checkAnswers(access, machine, checklist, input.items, transaction);
      const careTasks = await checkCareDone(access, machine, input.careDone, transaction);
      const performedAt = input.performedAt ? new Date(input.performedAt) : new Date();
      const reading = await walkaroundReading(
        access,
        machine,
        input.meterValue,
        performedAt,
        transaction,
      );
      // signed off at the walkaround's reading, on the lifetime scale, and its local date
      const careDoneAt = {
        lifetime: reading.lifetimeValue,
        on: todayIso(access.organization.timeZone, performedAt),
      };
      const careDone = planCare(careTasks, careDoneAt.lifetime, careDoneAt.on);
      const result = items.some((i) => i.result === 'fail')
        ? 'fail'
        : items.some((i) => i.result === 'attention')
          ? 'attention'
          : 'ok';
      const walkaround = await Walkaround.create(
        {
          organizationId: access.organization.id,
          machineId: machine.id,
          operatorId: access.userId,
          clientId: input.clientId,
          purpose: input.purpose,
          performedAt,
          meterValue: input.meterValue,
          readingId: reading?.id ?? null,
          templateId: checklist.template.id,
          templateName: checklist.template.name,
          items,
          result,
          notes: input.notes,
          careDone,
        },
        { transaction },
      );
      await signOffCare(
        access,
        machine,
        walkaround.id,
        careTasks,
        careDone,
        careDoneAt,
        transaction,
      );
      const photoIds = items.map((i) => i.photoId).filter((p): p is string => !!p);
      if (photoIds.length)
        await WalkaroundPhoto.update(
          { walkaroundId: walkaround.id },
          {
            where: { organizationId: access.organization.id, id: { [Op.in]: photoIds } },
            transaction,
          },
        );
      const defectIds: string[] = [];
      let taggedOut = false;
      for (const item of items.filter((i) => i.result !== 'ok')) {
        const severity =
          item.result === 'fail' ? (item.critical ? 'critical' : 'major') : ('minor' as const);
        const raised = await raiseDefect(
          access,
          machine,
          {
            title: `${item.label}: ${item.result === 'fail' ? 'fail' : 'needs attention'}`,
            description: item.note,
            severity,
          },
          { walkaroundId: walkaround.id, itemId: item.itemId, photoId: item.photoId },
          transaction,
        );
        defectIds.push(raised.defect.id);
        taggedOut ||= severity === 'critical';
      }
      if (taggedOut) await walkaround.update({ taggedOut: true }, { transaction });
      await recordAudit(
        {
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'walkaround.create',
          entityType: 'walkaround',
          entityId: walkaround.id,
          changes: { machineId: machine.id, result, meterValue: input.meterValue, taggedOut },
        },
        transaction,
      );
      return { walkaround, machine, created: true, defectIds };
    });
  } catch (err) {
    // Two copies of the same submission at once: the second finds the first.
    if (err instanceof UniqueConstraintError) {
      const first = await findByClientId(access, input);
      if (first) return first;
    }
    throw err;
  }
}

async function findByClientId(
  access: OrgAccess,
  input: WalkaroundCreateInput,
): Promise<WalkaroundOutcome | null> {
  const existing = await Walkaround.findOne({
    where: { organizationId: access.organization.id, clientId: input.clientId },
  });
  if (!existing) return null;
  if (existing.machineId !== input.machineId)
    throw new AppError(
      409,
      'client_id_used',
      'This clientId belongs to another walkaround; generate a new one for each walkaround',
      { clientId: 'Used by another walkaround' },
    );
  const { machine } = await loadMachine(access, existing.machineId);
  const defects = await Defect.findAll({
    where: { organizationId: access.organization.id, walkaroundId: existing.id },
    attributes: ['id'],
  });
  return { walkaround: existing, machine, created: false, defectIds: defects.map((d) => d.id) };
}

/** The walkaround's meter reading, through the reading rules (errors on meterValue / performedAt). */
const walkaroundReading = (
  access: OrgAccess,
  machine: Machine,
  value: number,
  takenAt: Date,
  transaction: Transaction,
) =>
  writeAccompanyingReading(
    access,
    { machine, value, takenAt, source: 'walkaround' },
    { value: 'meterValue', takenAt: 'performedAt' },
    transaction,
  );

/**
 * Submits a walkaround (or finds the one its clientId names) and answers with the machine as it
 * is now (a critical fail has tagged it out) and the defects raised, oldest first.
 */
export async function submitWalkaround(access: OrgAccess, input: WalkaroundCreateInput) {
  const outcome = await saveWalkaround(access, input);
  const machine = (await Machine.findByPk(outcome.machine.id))!;
  const defects = await Defect.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: outcome.defectIds } },
    order: [['createdAt', 'ASC']],
  });
  return { ...outcome, machine, defects };
}
