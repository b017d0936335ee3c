// The checks of a hitch span, refused in the words of the field or the clash: a pair that cannot
// be on the hitch log (400), a tractor without the meter asked for (400), a time ahead of now
// (400), an overlap with another span of the implement (409, the exclusion constraint as backstop).
import { DatabaseError, type Transaction } from 'sequelize';
import { AppError } from '../errors';
import type { Machine } from '../models';
import { takesReadings } from '../policies/machine';
import { directQuery } from '../db-direct';
import {
  HITCH_IMPLEMENT_CATEGORIES,
  HITCH_METER_KIND_LABELS,
  type HitchMeterKind,
} from '../../shared/schemas/hitch';

export const badField = (field: string, message: string) =>
  new AppError(400, 'invalid', `${field}: ${message}`, { [field]: message });

export const label = (m: Machine) => `${m.fleetNumber} ${m.name}`;

/** Refuses what cannot be on the hitch log, naming the field: 400. */
export function checkPair(implement: Machine, tractor: Machine) {
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

export async function checkTractorMeter(
  tractor: Machine,
  kind: HitchMeterKind,
  transaction: Transaction,
) {
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

export const timeWords = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

/** 409 when the implement is on a tractor at any time of [start, end) (end null: open). */
export async function checkNoOverlap(
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
export async function guarded<T>(implement: Machine, write: () => Promise<T>): Promise<T> {
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

export function notInFuture(field: string, at: Date, now: Date) {
  if (at.getTime() > now.getTime() + 60_000) throw badField(field, 'may not be in the future');
}
