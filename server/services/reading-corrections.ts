// Changes to a meter's recorded readings after the fact: correcting or deleting one reading.
// Each is audited and updates the meter's summary from the day(s) it touched. (Replacements and
// counter resets, which add readings, are meter-changes.ts.)
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid, notFound } from '../errors';
import { MachineForecast, MeterReading, type Machine } from '../models';
import { checkReading, toLifetimeValue } from '../../shared/domain';
import type { OrgAccess } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { refreshMachineForecast, storeForecasts } from './forecast';
import { recomputeImplementsOf } from './hitch-readings';
import {
  pickSummaryColumns,
  summaryFromColumns,
  type ReadingSummary,
  type SummaryReading,
} from './daily-summary';
import { lockMachineReadings, timeFormatter, writeContext } from './reading-neighbours';
import { meterRef, summaryAfterChange } from './reading-summary';
import { asStoredValue } from './readings';

const summaryReading = (r: MeterReading): SummaryReading => ({
  value: r.value,
  lifetimeValue: r.lifetimeValue,
  takenAt: r.takenAt,
});

/**
 * Stores the meter's summary after a correction or deletion, from the day(s) it touched; the
 * whole history is read only when there is no summary yet or the change emptied its window.
 */
async function updateSummary(
  access: OrgAccess,
  machine: Machine,
  meterId: string,
  stored: ReadingSummary | null,
  change: { before: SummaryReading; after?: SummaryReading },
  transaction: Transaction,
) {
  const { timeZone } = access.organization;
  const ref = meterRef(machine, { id: meterId });
  const summary = stored && (await summaryAfterChange(ref, stored, change, timeZone, transaction));
  if (!summary) {
    await refreshMachineForecast(machine.id, access.organization.id, transaction, { timeZone });
  } else {
    await storeForecasts(access.organization.id, new Map([[meterId, summary]]), {
      transaction,
      timeZone,
      machines: [machine],
      meters: [{ id: meterId, machineId: machine.id }],
    });
  }
  // a tractor's reading changed: the implements it pulled count its hours again
  const who = { organizationId: access.organization.id, timeZone, userId: access.userId };
  await recomputeImplementsOf(who, machine.id, transaction);
}

/** A reading of the caller's organization, or 404. */
export async function loadReading(access: OrgAccess, readingId: string) {
  const reading = await MeterReading.findOne({
    where: { id: readingId, organizationId: access.organization.id },
  });
  if (!reading) throw notFound('Reading');
  return reading;
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
    const old = summaryReading(reading);
    const value = asStoredValue(changes.value ?? reading.value);
    const takenAt = changes.takenAt ?? reading.takenAt;
    const context = await writeContext(
      machine,
      reading.meterId,
      takenAt.getTime(),
      takenAt.getTime(),
      transaction,
    );
    if (!context) throw notFound('Reading');
    const { replacements, meter } = context;
    // Validate as a new reading that ignores the one being corrected, then update in place.
    const existing = context.neighbours.filter((r) => r.id !== reading.id);
    const formatTime = timeFormatter(access.organization.timeZone);
    // the same value at the same time is another reading already: a copy, not a correction
    if (existing.some((r) => r.takenAtMs === takenAt.getTime() && r.value === value)) {
      throw invalid({
        takenAt: `A reading of ${value} ${meter.unit} taken ${formatTime(takenAt.getTime())} is already recorded — delete this one instead of making it a copy.`,
      });
    }
    const lifetime = toLifetimeValue(value, takenAt.getTime(), replacements);
    const previous = [...existing].reverse().find((r) => r.takenAtMs <= takenAt.getTime());
    const next = existing.find((r) => r.takenAtMs > takenAt.getTime());
    const violation = checkReading(
      { value: lifetime, takenAtMs: takenAt.getTime(), raw: value },
      {
        previous: previous && {
          value: previous.lifetimeValue,
          takenAtMs: previous.takenAtMs,
          raw: previous.value,
        },
        next: next && { value: next.lifetimeValue, takenAtMs: next.takenAtMs, raw: next.value },
      },
      {
        nowMs: Date.now(),
        meterUnit: meter.unit,
        formatTime,
      },
    );
    if (violation) throw invalid({ [violation.field]: violation.message });
    await reading.update({ value, takenAt, lifetimeValue: lifetime }, { transaction });
    // the stored values (numeric(14,2)), as the summary reads them back
    await reading.reload({ transaction });
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
    await updateSummary(
      access,
      machine,
      meter.id,
      context.summary,
      { before: old, after: summaryReading(reading) },
      transaction,
    );
    return reading;
  });
}

/** Deletes a reading; audited with its values so the log shows what was removed. */
export async function deleteReading(access: OrgAccess, machine: Machine, reading: MeterReading) {
  await sequelize.transaction(async (transaction) => {
    await lockMachineReadings(machine.id, transaction);
    // re-read under the lock: another edit may have changed or removed it meanwhile
    const stillThere = await MeterReading.count({ where: { id: reading.id }, transaction });
    if (!stillThere) throw notFound('Reading');
    await reading.reload({ transaction });
    const stored = await MachineForecast.findByPk(reading.meterId, { transaction });
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
    await updateSummary(
      access,
      machine,
      reading.meterId,
      stored && summaryFromColumns(pickSummaryColumns(stored)),
      { before: summaryReading(reading) },
      transaction,
    );
  });
}
