import type { Transaction } from 'sequelize';
import { AppError, invalid } from '../errors';
import { MeterReading, type Machine } from '../models';
import { checkReading, toLifetimeValue } from '../../shared/domain';
import type { ReadingSource } from '../../shared/constants';
import type { OrgAccess } from '../policies/context';
import { directQuery } from '../db-direct';
import { lockMachinesReadings, timeFormatter, writeContexts } from './reading-neighbours';
import { storeNewReadings, type MachineContext } from './reading-store';
import { recomputeImplements } from './hitch-readings';

export interface NewReading {
  machine: Machine;
  /** the machine's meter read; left out (null), its primary meter */
  meterId?: string | null;
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
  /** the meter it is on (the primary when none was named) */
  meterId: string;
}

/**
 * Checks and writes readings in the caller's transaction: every reading rule is checked against
 * its neighbours (existing and new); an identical repeat is accepted once and ignored after. Any
 * broken rule throws 422 naming each bad row (field `prefix.index.field`) and nothing is written.
 * Each machine's summary is then brought up to date from its new readings alone.
 */
export async function writeReadings(
  access: OrgAccess,
  items: NewReading[],
  transaction: Transaction,
  options: PlanOptions = {},
): Promise<ReadingOutcome[]> {
  const plan = await planReadings(access, items, transaction, options);
  if (Object.keys(plan.errors).length) throw invalid(plan.errors);
  return storePlannedReadings(access, plan, transaction);
}

/**
 * Writes what planReadings accepted (its toInsert), with the summaries, forecasts and hitched
 * implements that follow; the outcomes of the plan's items, in their order. A plan's refused
 * items are left out: every accepted reading was checked against accepted ones only.
 */
export async function storePlannedReadings(
  access: OrgAccess,
  plan: ReadingPlan,
  transaction: Transaction,
): Promise<ReadingOutcome[]> {
  const { toInsert } = plan;
  const outcomes = [...plan.outcomes];
  const rows = await storeNewReadings(
    access,
    toInsert.map(({ item, lifetime }) => ({
      organizationId: access.organization.id,
      machineId: item.machine.id,
      meterId: item.meterId!,
      value: item.value,
      lifetimeValue: lifetime,
      takenAt: item.takenAt,
      source: item.source,
      enteredBy: access.userId,
      importKey: item.importKey ?? null,
    })),
    plan.contexts,
    transaction,
  );
  toInsert.forEach(({ index }, i) =>
    outcomes.push({ index, status: 'added', reading: rows[i], meterId: rows[i].meterId }),
  );
  // a tractor pulling an implement: the implement's hours follow (hitch-readings.ts)
  if (rows.length && plan.hitched.size) {
    const { organization, userId } = access;
    const who = { organizationId: organization.id, timeZone: organization.timeZone, userId };
    await recomputeImplements(who, plan.hitched, transaction);
  }
  return outcomes.sort((a, b) => a.index - b.index);
}

/**
 * A meter value as its numeric(14,2) column stores it: PostgreSQL rounds the decimal digits it is
 * sent (String(value)) half away from zero. Rules and repeats are judged on this value, so two
 * readings that differ only past the second decimal are one reading, never a duplicate-key error.
 */
export function asStoredValue(value: number): number {
  const text = String(Math.abs(value));
  // only values under 1e-6 (or over 1e21) print with an exponent; under 0.005 they store as 0
  const shifted = text.includes('e') ? Math.abs(value) * 100 : Number(`${text}e2`);
  return (Math.sign(value) * Math.round(shifted)) / 100 || 0;
}

interface Point {
  lifetime: number;
  takenAtMs: number;
  raw: number;
}

const pointOrder = (a: Point, b: Point) => a.takenAtMs - b.takenAtMs || a.lifetime - b.lifetime;

export interface PlanOptions {
  fieldPrefix?: (index: number) => string;
  now?: Date;
  /** the caller holds every machine's row lock already (loadMachine with `lock`) */
  locked?: boolean;
}

/**
 * Checks readings against the rules and their neighbours without writing: what would be added,
 * what is an identical repeat, and every broken rule keyed by `prefix.index.field`. Readings are
 * checked per meter (the one named, else the machine's primary; a meter not on the machine is a
 * `prefix.index.meterId` error). Each machine is locked first; what was read under the lock
 * (meter, stored summary, tasks) comes back in `contexts`, by meter id, for the write.
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
  const byMeter = await groupByMeter(items, transaction);

  const toInsert: { item: NewReading; index: number; lifetime: number }[] = [];
  const contexts = new Map<string, MachineContext>();
  const hitched = new Set<string>();
  if (!options.locked)
    await lockMachinesReadings([...new Set(items.map((i) => i.machine.id))], transaction);
  const sortedGroups = byMeter.map((group) =>
    [...group].sort((a, b) => a.item.takenAt.getTime() - b.item.takenAt.getTime()),
  );
  // every meter's context in one statement, however many machines the batch names
  const loaded = await writeContexts(
    sortedGroups.map((sorted) => ({
      machine: sorted[0].item.machine,
      meterId: sorted[0].item.meterId,
      fromMs: sorted[0].item.takenAt.getTime(),
      toMs: sorted.at(-1)!.item.takenAt.getTime(),
    })),
    transaction,
  );
  for (const [g, sorted] of sortedGroups.entries()) {
    const machine = sorted[0].item.machine;
    const context = loaded[g];
    if (!context) {
      for (const { index } of sorted) errors[`${prefix(index)}meterId`] = NO_SUCH_METER;
      continue;
    }
    const { replacements, meter } = context;
    for (const id of context.hitchedImplementIds) hitched.add(id);
    contexts.set(meter.id, { machine, meter, summary: context.summary, tasks: context.tasks });
    const existing: Point[] = context.neighbours.map((r) => ({
      lifetime: r.lifetimeValue,
      takenAtMs: r.takenAtMs,
      raw: r.value,
    }));
    // One pass in time order (a large import stays O(n log n)): the previous reading is the later
    // of the last existing one at or before this time and the latest new one accepted so far; the
    // next is always an existing one, as every accepted new reading is at or before this time.
    const seen = new Set(existing.map((r) => `${r.takenAtMs}:${r.raw}`));
    let after = 0;
    let newest: Point | undefined;
    for (const { item, index } of sorted) {
      const takenAtMs = item.takenAt.getTime();
      const value = asStoredValue(item.value);
      const lifetime = asStoredValue(toLifetimeValue(value, takenAtMs, replacements));
      if (seen.has(`${takenAtMs}:${value}`)) {
        outcomes.push({ index, status: 'duplicate', reading: null, meterId: meter.id });
        continue;
      }
      while (after < existing.length && existing[after].takenAtMs <= takenAtMs) after++;
      const before = existing[after - 1];
      const previous = !newest || (before && pointOrder(before, newest) > 0) ? before : newest;
      const next = existing[after];
      const violation = checkReading(
        // each with the value its meter showed, so a refusal speaks in the meter fitted now
        { value: lifetime, takenAtMs, raw: value },
        {
          previous: previous && {
            value: previous.lifetime,
            takenAtMs: previous.takenAtMs,
            raw: previous.raw,
          },
          next: next && { value: next.lifetime, takenAtMs: next.takenAtMs, raw: next.raw },
        },
        { nowMs, meterUnit: meter.unit, formatTime: fmt },
      );
      if (violation) {
        errors[`${prefix(index)}${violation.field}`] = violation.message;
        continue;
      }
      const point = { lifetime, takenAtMs, raw: value };
      seen.add(`${takenAtMs}:${value}`);
      if (!newest || pointOrder(point, newest) >= 0) newest = point;
      toInsert.push({ item: { ...item, value, meterId: meter.id }, index, lifetime });
    }
  }
  return { outcomes, errors, toInsert, contexts, hitched };
}

/** What planReadings found: outcomes of repeats, broken rules, and what to write. */
export type ReadingPlan = Awaited<ReturnType<typeof planReadings>>;

/** The refusal of a meter id that is not one of the machine's meters. */
export const NO_SUCH_METER = 'No such meter on this machine';

/**
 * The items grouped by the meter they are on, in order of first appearance. A machine named
 * both with and without its primary meter's id in one batch gets its primary looked up first
 * (one statement, only then), so the two land in one group.
 */
async function groupByMeter(items: NewReading[], transaction: Transaction) {
  const named = new Set<string>();
  const unnamed = new Set<string>();
  for (const item of items) (item.meterId ? named : unnamed).add(item.machine.id);
  const mixed = [...unnamed].filter((id) => named.has(id));
  const primary = new Map<string, string>();
  if (mixed.length) {
    const rows = await directQuery<{ id: string; machine_id: string }>(
      transaction,
      'SELECT id, machine_id FROM machine_meters WHERE machine_id = ANY($1::uuid[]) AND is_primary',
      [mixed],
    );
    for (const r of rows) primary.set(r.machine_id, r.id);
  }
  const groups = new Map<string, { item: NewReading; index: number }[]>();
  for (const [index, item] of items.entries()) {
    const meter = item.meterId ?? primary.get(item.machine.id) ?? '';
    const key = `${item.machine.id}|${meter}`;
    const group = groups.get(key);
    if (group) group.push({ item, index });
    else groups.set(key, [{ item, index }]);
  }
  return [...groups.values()];
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
          meterId: outcome.meterId,
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
