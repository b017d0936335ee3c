// The hitch log's writes: hitch, unhitch, correct and remove a span, each in one transaction that
// then brings the implement's hitch readings up to date (hitch-readings.ts). Locks go tractor
// first, implement second, as a tractor's reading post takes them.
import { DatabaseError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, notFound } from '../errors';
import { recordAudit } from '../infra/audit';
import type { Machine } from '../models';
import { HitchSpan } from '../models/hitch-span';
import { authorize } from '../policies/access';
import type { OrgAccess } from '../policies/context';
import { canCorrectHitch, canHitch, CORRECT_HITCH_REFUSAL, HITCH_REFUSAL } from '../policies/hitch';
import { takesReadings } from '../policies/machine';
import { directQuery } from '../db-direct';
import {
  HITCH_IMPLEMENT_CATEGORIES,
  HITCH_METER_KIND_LABELS,
  type HitchMeterKind,
  type HitchSpanCreateInput,
  type HitchSpanEndInput,
  type HitchSpanUpdateInput,
} from '../../shared/schemas/hitch';
import { recomputeImplements } from './hitch-readings';
import { loadMachine } from './machine-load';

const badField = (field: string, message: string) =>
  new AppError(400, 'invalid', `${field}: ${message}`, { [field]: message });

const label = (m: Machine) => `${m.fleetNumber} ${m.name}`;

/** Refuses what cannot be on the hitch log, naming the field: 400. */
function checkPair(implement: Machine, tractor: Machine) {
  if (implement.id === tractor.id)
    throw badField('tractorId', 'An implement cannot be hitched to itself');
  if (tractor.category !== 'tractor')
    throw badField('tractorId', `${label(tractor)} is not a tractor; pick the tractor that pulls`);
  if (!(HITCH_IMPLEMENT_CATEGORIES as readonly string[]).includes(implement.category))
    throw badField(
      'implementId',
      `${label(implement)} is not an implement: only implements, mowers and balers are hitched`,
    );
  if (implement.meterUnit !== 'h')
    throw badField(
      'implementId',
      `${label(implement)} counts ${implement.meterUnit}; hours from hitching need a meter in hours`,
    );
  if (!takesReadings(implement)) throw badField('implementId', `${label(implement)} is sold`);
  if (!takesReadings(tractor)) throw badField('tractorId', `${label(tractor)} is sold`);
}

async function checkTractorMeter(tractor: Machine, kind: HitchMeterKind, transaction: Transaction) {
  const [row] = await directQuery<{ n: number }>(
    transaction,
    'SELECT count(*)::int AS n FROM machine_meters WHERE organization_id = $1 AND machine_id = $2 AND kind = $3',
    [tractor.organizationId, tractor.id, kind],
  );
  if (!row?.n)
    throw badField(
      'meterKind',
      `${label(tractor)} has no meter for ${HITCH_METER_KIND_LABELS[kind]}`,
    );
}

const timeWords = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

/** 409 when the implement is on a tractor at any time of [start, end) (end null: open). */
async function checkNoOverlap(
  implement: Machine,
  startedAt: Date,
  endedAt: Date | null,
  transaction: Transaction,
  exceptId?: string,
) {
  const [clash] = await directQuery<{ fleet: string; started_at: Date; ended_at: Date | null }>(
    transaction,
    `SELECT t.fleet_number AS fleet, s.started_at, s.ended_at FROM hitch_spans s
     JOIN machines t ON t.id = s.tractor_id
     WHERE s.organization_id = $1 AND s.implement_id = $2 AND s.id IS DISTINCT FROM $5::uuid
       AND tstzrange(s.started_at, s.ended_at, '[)') && tstzrange($3, $4, '[)')
     ORDER BY s.started_at LIMIT 1`,
    [implement.organizationId, implement.id, startedAt, endedAt, exceptId ?? null],
  );
  if (clash) throw overlap(implement, clash.fleet, clash.started_at, clash.ended_at);
}

const overlap = (implement: Machine, fleet: string, from: Date, to: Date | null) =>
  new AppError(
    409,
    'hitch_overlap',
    `${implement.fleetNumber} is on ${fleet} from ${timeWords(new Date(from))}` +
      (to ? ` to ${timeWords(new Date(to))}` : ' and still hitched') +
      ': an implement is on one tractor at a time; unhitch it there first or pick other times',
  );

/** The exclusion constraint, should two writers slip past the check: the same 409. */
async function guarded<T>(implement: Machine, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    const code = (err as DatabaseError & { parent?: { code?: string } }).parent?.code;
    if (err instanceof DatabaseError && code === '23P01')
      throw new AppError(
        409,
        'hitch_overlap',
        `${implement.fleetNumber} is on another tractor then`,
      );
    throw err;
  }
}

function notInFuture(field: string, at: Date, now: Date) {
  if (at.getTime() > now.getTime() + 60_000) throw badField(field, 'may not be in the future');
}

const whoOf = (access: OrgAccess) => ({
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

/** Hitches an implement to a tractor (now, or the times given); 201 with the span. */
export async function startSpan(access: OrgAccess, input: HitchSpanCreateInput) {
  if (input.implementId === input.tractorId)
    throw badField('tractorId', 'An implement cannot be hitched to itself');
  return sequelize.transaction(async (transaction) => {
    const now = new Date();
    const tractor = await loadMachine(access, input.tractorId, transaction, { lock: true });
    const implement = await loadMachine(access, input.implementId, transaction, { lock: true });
    checkPair(implement.machine, tractor.machine);
    authorize(canHitch(access, implement.operatorIds, tractor.operatorIds), HITCH_REFUSAL);
    await checkTractorMeter(tractor.machine, input.meterKind, transaction);
    const startedAt = input.startedAt ? new Date(input.startedAt) : now;
    const endedAt = input.endedAt ? new Date(input.endedAt) : null;
    notInFuture('startedAt', startedAt, now);
    if (endedAt) notInFuture('endedAt', endedAt, now);
    await checkNoOverlap(implement.machine, startedAt, endedAt, transaction);
    const span = await guarded(implement.machine, () =>
      HitchSpan.create(
        {
          organizationId: access.organization.id,
          implementId: implement.machine.id,
          tractorId: tractor.machine.id,
          meterKind: input.meterKind,
          startedAt,
          endedAt,
          enteredBy: access.userId,
          note: input.note,
        },
        { transaction },
      ),
    );
    await audit(access, 'hitch.start', span, transaction);
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

/** Unhitches: the span ends now, or at the time given. */
export async function endSpan(access: OrgAccess, spanId: string, input: HitchSpanEndInput) {
  return sequelize.transaction(async (transaction) => {
    const { span, implement, tractor } = await loadSpan(access, spanId, transaction);
    authorize(canHitch(access, implement.operatorIds, tractor.operatorIds), HITCH_REFUSAL);
    if (span.endedAt)
      throw new AppError(409, 'hitch_ended', `Already unhitched at ${timeWords(span.endedAt)}`);
    const now = new Date();
    const endedAt = input.endedAt ? new Date(input.endedAt) : now;
    notInFuture('endedAt', endedAt, now);
    if (endedAt <= span.startedAt)
      throw badField(
        'endedAt',
        `Unhitched at must be after Hitched at (${timeWords(span.startedAt)})`,
      );
    await span.update({ endedAt }, { transaction });
    await audit(access, 'hitch.end', span, transaction);
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
