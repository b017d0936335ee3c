import type { Transaction } from 'sequelize';
import { AppError, invalid } from '../errors';
import { MeterReading, type Machine } from '../models';
import { checkReading, toLifetimeValue } from '../../shared/domain';
import type { ReadingSource } from '../../shared/constants';
import type { OrgAccess } from '../policies/context';
import { refreshMachineForecast } from './forecast';
import {
  lockMachineReadings,
  readingsAround,
  replacementsOf,
  timeFormatter,
} from './reading-neighbours';

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
        // each with the value its meter showed, so a refusal speaks in the meter fitted now
        { value: lifetime, takenAtMs, raw: item.value },
        {
          previous: previous && {
            value: previous.lifetime,
            takenAtMs: previous.takenAtMs,
            raw: previous.raw,
          },
          next: next && { value: next.lifetime, takenAtMs: next.takenAtMs, raw: next.raw },
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
