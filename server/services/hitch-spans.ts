// The hitch log's writes: hitch, unhitch, correct and remove a span, each in one transaction that
// then brings the implement's hitch readings up to date (hitch-readings.ts). Locks go tractor
// first, implement second, as a tractor's reading post takes them.
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, notFound } from '../errors';
import { recordAudit } from '../infra/audit';
import { HitchSpan } from '../models/hitch-span';
import { authorize } from '../policies/access';
import type { OrgAccess } from '../policies/context';
import { canCorrectHitch, canHitch, CORRECT_HITCH_REFUSAL, HITCH_REFUSAL } from '../policies/hitch';
import type {
  HitchSpanCreateInput,
  HitchSpanEndInput,
  HitchSpanUpdateInput,
} from '../../shared/schemas/hitch';
import {
  badField,
  checkNoOverlap,
  checkPair,
  checkTractorMeter,
  guarded,
  notInFuture,
  timeWords,
} from './hitch-span-checks';
import { recomputeImplements } from './hitch-readings';
import { loadMachine } from './machine-load';

export const whoOf = (access: OrgAccess) => ({
  organizationId: access.organization.id,
  timeZone: access.organization.timeZone,
  userId: access.userId,
});

async function audit(access: OrgAccess, action: string, span: HitchSpan, transaction: Transaction) {
  await recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType: 'hitch_span',
      entityId: span.id,
      changes: {
        implementId: span.implementId,
        tractorId: span.tractorId,
        meterKind: span.meterKind,
        startedAt: span.startedAt.toISOString(),
        endedAt: span.endedAt?.toISOString() ?? null,
      },
    },
    transaction,
  );
}

type Loaded = Awaited<ReturnType<typeof loadMachine>>;

/**
 * Opens a span of two machines already loaded and locked (tractor first): the pair, the caller's
 * right, the tractor's meter, the times and overlaps checked, the span written and audited. The
 * implement's hours are the caller's to work out again (recomputeImplements).
 */
export async function openSpanLocked(
  access: OrgAccess,
  implement: Loaded,
  tractor: Loaded,
  input: Pick<HitchSpanCreateInput, 'meterKind' | 'note'> & {
    startedAt: Date;
    endedAt: Date | null;
  },
  transaction: Transaction,
) {
  const now = new Date();
  checkPair(implement.machine, tractor.machine);
  authorize(canHitch(access, implement.operatorIds, tractor.operatorIds), HITCH_REFUSAL);
  await checkTractorMeter(tractor.machine, input.meterKind, transaction);
  notInFuture('startedAt', input.startedAt, now);
  if (input.endedAt) notInFuture('endedAt', input.endedAt, now);
  await checkNoOverlap(implement.machine, input.startedAt, input.endedAt, transaction);
  const span = await guarded(implement.machine, () =>
    HitchSpan.create(
      {
        organizationId: access.organization.id,
        implementId: implement.machine.id,
        tractorId: tractor.machine.id,
        meterKind: input.meterKind,
        startedAt: input.startedAt,
        endedAt: input.endedAt,
        enteredBy: access.userId,
        note: input.note,
      },
      { transaction },
    ),
  );
  await audit(access, 'hitch.start', span, transaction);
  return span;
}

/** Hitches an implement to a tractor (now, or the times given); 201 with the span. */
export async function startSpan(access: OrgAccess, input: HitchSpanCreateInput) {
  if (input.implementId === input.tractorId)
    throw badField('tractorId', 'An implement cannot be hitched to itself');
  return sequelize.transaction(async (transaction) => {
    const tractor = await loadMachine(access, input.tractorId, transaction, { lock: true });
    const implement = await loadMachine(access, input.implementId, transaction, { lock: true });
    const span = await openSpanLocked(
      access,
      implement,
      tractor,
      {
        meterKind: input.meterKind,
        note: input.note,
        startedAt: input.startedAt ? new Date(input.startedAt) : new Date(),
        endedAt: input.endedAt ? new Date(input.endedAt) : null,
      },
      transaction,
    );
    await recomputeImplements(whoOf(access), [span.implementId], transaction);
    return span;
  });
}

/** The span with both machines loaded and locked (tractors first), scoped to the caller. */
async function loadSpan(
  access: OrgAccess,
  spanId: string,
  transaction: Transaction,
  newTractorId?: string,
) {
  const span = await HitchSpan.findOne({
    where: { id: spanId, organizationId: access.organization.id },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!span) throw notFound('Hitch span');
  const tractorIds = [...new Set([span.tractorId, newTractorId ?? span.tractorId])].sort();
  const tractors: Awaited<ReturnType<typeof loadMachine>>[] = [];
  for (const id of tractorIds)
    tractors.push(await loadMachine(access, id, transaction, { lock: true }));
  const implement = await loadMachine(access, span.implementId, transaction, { lock: true });
  const tractorOf = (id: string) => tractors.find((t) => t.machine.id === id)!;
  return {
    span,
    implement,
    tractor: tractorOf(span.tractorId),
    newTractor: tractorOf(newTractorId ?? span.tractorId),
  };
}

/**
 * Closes an open span at `endedAt`, its machines already loaded and locked (tractor first): the
 * caller's right, the time checked (after the start, not ahead of now), audited. The implement's
 * hours are the caller's to work out again.
 */
export async function closeSpanLocked(
  access: OrgAccess,
  span: HitchSpan,
  implement: Loaded,
  tractor: Loaded,
  endedAt: Date,
  transaction: Transaction,
) {
  authorize(canHitch(access, implement.operatorIds, tractor.operatorIds), HITCH_REFUSAL);
  if (span.endedAt)
    throw new AppError(409, 'hitch_ended', `Already unhitched at ${timeWords(span.endedAt)}`);
  notInFuture('endedAt', endedAt, new Date());
  if (endedAt <= span.startedAt)
    throw badField(
      'endedAt',
      `Unhitched at must be after Hitched at (${timeWords(span.startedAt)})`,
    );
  await span.update({ endedAt }, { transaction });
  await audit(access, 'hitch.end', span, transaction);
}

/** Unhitches: the span ends now, or at the time given. */
export async function endSpan(access: OrgAccess, spanId: string, input: HitchSpanEndInput) {
  return sequelize.transaction(async (transaction) => {
    const { span, implement, tractor } = await loadSpan(access, spanId, transaction);
    const endedAt = input.endedAt ? new Date(input.endedAt) : new Date();
    await closeSpanLocked(access, span, implement, tractor, endedAt, transaction);
    await recomputeImplements(whoOf(access), [span.implementId], transaction);
    return span;
  });
}

/** A correction: only the fields sent change; the implement's hours are worked out again. */
export async function correctSpan(access: OrgAccess, spanId: string, input: HitchSpanUpdateInput) {
  return sequelize.transaction(async (transaction) => {
    authorize(canCorrectHitch(access), CORRECT_HITCH_REFUSAL);
    const { span, implement, newTractor } = await loadSpan(
      access,
      spanId,
      transaction,
      input.tractorId,
    );
    // only what is sent is checked again: a past span stays correctable after its tractor was
    // sold or reclassed
    if (input.tractorId !== undefined) checkPair(implement.machine, newTractor.machine);
    if (input.tractorId !== undefined || input.meterKind !== undefined)
      await checkTractorMeter(newTractor.machine, input.meterKind ?? span.meterKind, transaction);
    const startedAt = input.startedAt ? new Date(input.startedAt) : span.startedAt;
    const endedAt =
      input.endedAt === undefined ? span.endedAt : input.endedAt ? new Date(input.endedAt) : null;
    const now = new Date();
    notInFuture('startedAt', startedAt, now);
    if (endedAt) notInFuture('endedAt', endedAt, now);
    if (endedAt && endedAt <= startedAt)
      throw badField('endedAt', 'Unhitched at must be after Hitched at');
    await checkNoOverlap(implement.machine, startedAt, endedAt, transaction, span.id);
    const changes = {
      ...(input.tractorId !== undefined && { tractorId: input.tractorId }),
      ...(input.meterKind !== undefined && { meterKind: input.meterKind }),
      ...(input.startedAt !== undefined && { startedAt }),
      ...(input.endedAt !== undefined && { endedAt }),
      ...(input.note !== undefined && { note: input.note }),
    };
    await guarded(implement.machine, () => span.update(changes, { transaction }));
    await audit(access, 'hitch.correct', span, transaction);
    await recomputeImplements(whoOf(access), [span.implementId], transaction);
    return span;
  });
}

/** Removes a span entered by mistake; the implement loses the hours it brought. */
export async function deleteSpan(access: OrgAccess, spanId: string) {
  await sequelize.transaction(async (transaction) => {
    authorize(canCorrectHitch(access), CORRECT_HITCH_REFUSAL);
    const { span } = await loadSpan(access, spanId, transaction);
    await audit(access, 'hitch.delete', span, transaction);
    await span.destroy({ transaction });
    await recomputeImplements(whoOf(access), [span.implementId], transaction);
  });
}
