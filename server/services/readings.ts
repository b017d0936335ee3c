import { Op, QueryTypes, type Transaction } from 'sequelize';
import { format } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { sequelize } from '../db';
import { AppError, invalid, notFound } from '../errors';
import { Machine, MeterReading, MeterReplacement } from '../models';
import { checkReading, toLifetimeValue, type MeterReplacementPoint } from '../../shared/domain';
import type { ReadingSource } from '../../shared/constants';
import type { OrgAccess } from '../policies/access';
import { refreshMachineForecast } from './forecast';
import { recordAudit } from '../infra/audit';

export interface NewReading {
  machine: Machine;
  /** value shown on the meter fitted at the time */
  value: number;
  takenAt: Date;
  source: ReadingSource;
  importKey?: string | null;
}

export interface ReadingOutcome {
  index: number;
  status: 'added' | 'duplicate';
  reading: MeterReading | null;
}

interface Neighbour {
  id: string;
  value: number;
  lifetimeValue: number;
  takenAtMs: number;
}

/** A formatter of instants in the organization's time zone, for messages. */
export const timeFormatter = (timeZone: string) => (ms: number) =>
  `${format(new TZDate(ms, timeZone), 'yyyy-MM-dd HH:mm')} (${timeZone})`;

async function replacementsOf(
  machine: Machine,
  transaction: Transaction,
): Promise<MeterReplacementPoint[]> {
  const rows = await MeterReplacement.findAll({
    where: { organizationId: machine.organizationId, machineId: machine.id },
    transaction,
  });
  return rows.map((r) => ({
    replacedAtMs: r.replacedAt.getTime(),
    oldFinalValue: r.oldFinalValue,
    newStartValue: r.newStartValue,
  }));
}

/** Existing readings of a machine from the one before `fromMs` to the one after `toMs`. */
async function readingsAround(
  machine: Machine,
  fromMs: number,
  toMs: number,
  transaction: Transaction,
) {
  const rows = await sequelize.query<{
    id: string;
    value: number;
    lifetime_value: number;
    taken_at: Date;
  }>(
    `SELECT id, value, lifetime_value, taken_at FROM meter_readings
     WHERE organization_id = :org AND machine_id = :machine
       AND taken_at >= coalesce((SELECT max(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at < :from), '-infinity')
       AND taken_at <= coalesce((SELECT min(taken_at) FROM meter_readings
                                 WHERE organization_id = :org AND machine_id = :machine AND taken_at > :to), 'infinity')
     ORDER BY taken_at, lifetime_value`,
    {
      replacements: {
        org: machine.organizationId,
        machine: machine.id,
        from: new Date(fromMs),
        to: new Date(toMs),
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return rows.map<Neighbour>((r) => ({
    id: r.id,
    value: Number(r.value),
    lifetimeValue: Number(r.lifetime_value),
    takenAtMs: new Date(r.taken_at).getTime(),
  }));
}

/**
 * Checks and writes readings in the caller's transaction: every reading rule is checked against
 * its neighbours (existing and new); an identical repeat is accepted once and ignored after. Any
 * broken rule throws 422 naming each bad row (field `prefix.index.field`) and nothing is written.
 */
export async function writeReadings(
  access: OrgAccess,
  items: NewReading[],
  transaction: Transaction,
  options: PlanOptions = {},
): Promise<ReadingOutcome[]> {
  const { outcomes, errors, toInsert } = await planReadings(access, items, transaction, options);
  if (Object.keys(errors).length) throw invalid(errors);
  for (const { item, index, lifetime } of toInsert) {
    const reading = await MeterReading.create(
      {
        organizationId: access.organization.id,
        machineId: item.machine.id,
        value: item.value,
        lifetimeValue: lifetime,
        takenAt: item.takenAt,
        source: item.source,
        enteredBy: access.userId,
        importKey: item.importKey ?? null,
      },
      { transaction },
    );
    outcomes.push({ index, status: 'added', reading });
  }
  for (const machineId of new Set(toInsert.map((t) => t.item.machine.id))) {
    await refreshMachineForecast(machineId, access.organization.id, transaction);
  }
  return outcomes.sort((a, b) => a.index - b.index);
}

interface PlanOptions {
  fieldPrefix?: (index: number) => string;
  now?: Date;
}

/**
 * Checks readings against the rules and their neighbours without writing: what would be added,
 * what is an identical repeat, and every broken rule keyed by `prefix.index.field`.
 */
export async function planReadings(
  access: OrgAccess,
  items: NewReading[],
  transaction: Transaction,
  options: PlanOptions = {},
) {
  const nowMs = (options.now ?? new Date()).getTime();
  const fmt = timeFormatter(access.organization.timeZone);
  const prefix = options.fieldPrefix ?? (() => '');
  const errors: Record<string, string> = {};
  const outcomes: ReadingOutcome[] = [];
  const byMachine = new Map<string, { item: NewReading; index: number }[]>();
  items.forEach((item, index) => {
    byMachine.set(item.machine.id, [...(byMachine.get(item.machine.id) ?? []), { item, index }]);
  });

  const toInsert: { item: NewReading; index: number; lifetime: number }[] = [];
  for (const group of byMachine.values()) {
    const machine = group[0].item.machine;
    await lockMachineReadings(machine.id, transaction);
    const replacements = await replacementsOf(machine, transaction);
    const times = group.map((g) => g.item.takenAt.getTime());
    const existing = await readingsAround(
      machine,
      Math.min(...times),
      Math.max(...times),
      transaction,
    );
    const merged: { lifetime: number; takenAtMs: number; raw: number }[] = existing.map((r) => ({
      lifetime: r.lifetimeValue,
      takenAtMs: r.takenAtMs,
      raw: r.value,
    }));
    const sorted = [...group].sort((a, b) => a.item.takenAt.getTime() - b.item.takenAt.getTime());
    for (const { item, index } of sorted) {
      const takenAtMs = item.takenAt.getTime();
      const lifetime = toLifetimeValue(item.value, takenAtMs, replacements);
      if (merged.some((r) => r.takenAtMs === takenAtMs && r.raw === item.value)) {
        outcomes.push({ index, status: 'duplicate', reading: null });
        continue;
      }
      const previous = [...merged].reverse().find((r) => r.takenAtMs <= takenAtMs);
      const next = merged.find((r) => r.takenAtMs > takenAtMs);
      const violation = checkReading(
        { value: lifetime, takenAtMs },
        {
          previous: previous && { value: previous.lifetime, takenAtMs: previous.takenAtMs },
          next: next && { value: next.lifetime, takenAtMs: next.takenAtMs },
        },
        { nowMs, meterUnit: machine.meterUnit, formatTime: fmt },
      );
      if (violation) {
        errors[`${prefix(index)}${violation.field}`] = violation.message;
        continue;
      }
      merged.push({ lifetime, takenAtMs, raw: item.value });
      merged.sort((a, b) => a.takenAtMs - b.takenAtMs || a.lifetime - b.lifetime);
      toInsert.push({ item, index, lifetime });
    }
  }
  return { outcomes, errors, toInsert };
}

/**
 * Writes the one reading that comes with a service record or a walkaround, through the same rules
 * as any other; an identical repeat returns the reading already stored. A refusal is renamed to
 * the caller's form fields (e.g. value → meterValue, takenAt → performedOn).
 */
export async function writeAccompanyingReading(
  access: OrgAccess,
  item: NewReading,
  fields: { value: string; takenAt: string },
  transaction: Transaction,
): Promise<MeterReading> {
  try {
    const [outcome] = await writeReadings(access, [item], transaction);
    const reading =
      outcome.reading ??
      (await MeterReading.findOne({
        where: {
          organizationId: access.organization.id,
          machineId: item.machine.id,
          takenAt: item.takenAt,
          value: item.value,
        },
        transaction,
      }));
    return reading!;
  } catch (err) {
    if (err instanceof AppError && err.fields) {
      throw invalid(
        Object.fromEntries(
          Object.entries(err.fields).map(([k, v]) => [
            k === 'takenAt' ? fields.takenAt : fields.value,
            v,
          ]),
        ),
      );
    }
    throw err;
  }
}

/**
 * Serialises every writer of one machine's readings (new, corrected, deleted) on the machine's row,
 * so two people editing at once cannot each pass the neighbour checks against a stale neighbour.
 */
async function lockMachineReadings(machineId: string, transaction: Transaction) {
  await sequelize.query('SELECT id FROM machines WHERE id = :id FOR UPDATE', {
    replacements: { id: machineId },
    transaction,
  });
}

/** Corrects a reading's value or time (rules re-checked against its neighbours); audited. */
export async function correctReading(
  access: OrgAccess,
  machine: Machine,
  reading: MeterReading,
  changes: { value?: number; takenAt?: Date },
) {
  return sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    // re-read under the lock: another edit may have changed or removed it meanwhile
    const stillThere = await MeterReading.count({ where: { id: reading.id }, transaction });
    if (!stillThere) throw notFound('Reading');
    await reading.reload({ transaction });
    const before = { value: reading.value, takenAt: reading.takenAt.toISOString() };
    const value = changes.value ?? reading.value;
    const takenAt = changes.takenAt ?? reading.takenAt;
    const replacements = await replacementsOf(machine, transaction);
    // Validate as a new reading that ignores the one being corrected, then update in place.
    const existing = (
      await readingsAround(machine, takenAt.getTime(), takenAt.getTime(), transaction)
    ).filter((r) => r.id !== reading.id);
    const lifetime = toLifetimeValue(value, takenAt.getTime(), replacements);
    const previous = [...existing].reverse().find((r) => r.takenAtMs <= takenAt.getTime());
    const next = existing.find((r) => r.takenAtMs > takenAt.getTime());
    const violation = checkReading(
      { value: lifetime, takenAtMs: takenAt.getTime() },
      {
        previous: previous && { value: previous.lifetimeValue, takenAtMs: previous.takenAtMs },
        next: next && { value: next.lifetimeValue, takenAtMs: next.takenAtMs },
      },
      {
        nowMs: Date.now(),
        meterUnit: machine.meterUnit,
        formatTime: timeFormatter(access.organization.timeZone),
      },
    );
    if (violation) throw invalid({ [violation.field]: violation.message });
    await reading.update({ value, takenAt, lifetimeValue: lifetime }, { transaction });
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'reading.correct',
        entityType: 'meter_reading',
        entityId: reading.id,
        changes: {
          machineId: machine.id,
          before,
          after: { value, takenAt: takenAt.toISOString() },
        },
      },
      transaction,
    );
    await refreshMachineForecast(machine.id, access.organization.id, transaction);
    return reading;
  });
}

/** Deletes a reading; audited with its values so the log shows what was removed. */
export async function deleteReading(access: OrgAccess, machine: Machine, reading: MeterReading) {
  await sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    await reading.destroy({ transaction });
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'reading.delete',
        entityType: 'meter_reading',
        entityId: reading.id,
        changes: {
          machineId: machine.id,
          value: reading.value,
          takenAt: reading.takenAt.toISOString(),
          source: reading.source,
        },
      },
      transaction,
    );
    await refreshMachineForecast(machine.id, access.organization.id, transaction);
  });
}

/**
 * Records a meter replacement: the old meter's final reading just before, the new meter's start at
 * the replacement time; lifetime values stay continuous.
 */
export async function replaceMeter(
  access: OrgAccess,
  machine: Machine,
  input: { oldFinalValue: number; newStartValue: number; replacedAt: Date; note: string },
) {
  return sequelize.transaction(async (transaction) => {
    const later = await MeterReading.count({
      where: {
        organizationId: machine.organizationId,
        machineId: machine.id,
        takenAt: { [Op.gte]: input.replacedAt },
      },
      transaction,
    });
    if (later > 0) {
      throw invalid({
        replacedAt:
          'There are readings after this time; a replacement must come after the last reading',
      });
    }
    const replacement = await MeterReplacement.create(
      {
        organizationId: machine.organizationId,
        machineId: machine.id,
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
            value: input.oldFinalValue,
            takenAt: new Date(input.replacedAt.getTime() - 1000),
            source: 'manual',
          },
          { machine, value: input.newStartValue, takenAt: input.replacedAt, source: 'manual' },
        ],
        transaction,
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
        action: 'meter.replace',
        entityType: 'meter_replacement',
        entityId: replacement.id,
        changes: { machineId: machine.id, ...input, replacedAt: input.replacedAt.toISOString() },
      },
      transaction,
    );
    return replacement;
  });
}
