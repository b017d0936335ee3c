import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { notFound } from '../errors';
import { ServiceRecord, type ServiceTask, type Machine } from '../models';
import type {
  ServiceFluid,
  ServicePart,
  ServiceRecordCreateInput,
} from '../../shared/schemas/service-records';
import type { OrgAccess } from '../policies/access';
import { loadMachine } from './machines';
import { closeDefects } from './defects';
import { plannedVisitsCovering } from './planned-visits';
import {
  checkDefectsActive,
  checkPerformedOn,
  checkReassembly,
  checkTechnicians,
  meterTime,
  refuseDealerDefects,
  resolveTasks,
} from './service-record-checks';
import {
  auditRecord,
  replaceMeasurements,
  resetTasks,
  serviceReading,
  snapshotTasks,
  type TaskReset,
} from './service-record-writes';

// A service record's loading and creation; completing a plan is in service-record-completion.ts,
// edits and cancelling in service-record-edits.ts, history and measurements in service-history.ts.

/** The record if it is in the caller's organization on a machine they may see; else 404. */
export async function loadRecord(access: OrgAccess, recordId: string, transaction?: Transaction) {
  const record = await ServiceRecord.findOne({
    where: { id: recordId, organizationId: access.organization.id },
    transaction,
    ...(transaction && { lock: transaction.LOCK.UPDATE }),
  });
  if (!record) throw notFound('Service record');
  const { machine } = await loadMachine(access, record.machineId, transaction).catch(() => {
    throw notFound('Service record');
  });
  return { record, machine };
}

const round = (n: number, places = 2) => Math.round(n * 10 ** places) / 10 ** places;

/** Parts (wear parts aside) and fluids the tasks' lists call for, summed by part number (and by fluid kind + unit). */
export function prefillLines(tasks: Pick<ServiceTask, 'parts' | 'fluids'>[]): {
  parts: ServicePart[];
  fluids: ServiceFluid[];
} {
  const parts = new Map<string, ServicePart>();
  const fluids = new Map<string, ServiceFluid>();
  for (const t of tasks) {
    for (const p of t.parts) {
      // a wear part is inspected, not used up: the technician adds it if one was replaced
      if (p.wearPart) continue;
      const key = p.partNumber.trim().toUpperCase();
      const line = parts.get(key);
      if (line) line.quantity = round(line.quantity + p.quantity, 3);
      else
        parts.set(key, {
          partNumber: p.partNumber,
          description: p.description,
          quantity: p.quantity,
          unitCostMinor: null,
        });
    }
    for (const f of t.fluids) {
      const key = `${f.kind.trim().toLowerCase()}|${f.unit}`;
      const line = fluids.get(key);
      if (line) line.volume = round(line.volume + f.volume, 2);
      else fluids.set(key, { kind: f.kind, volume: f.volume, unit: f.unit, unitCostMinor: null });
    }
  }
  return { parts: [...parts.values()], fluids: [...fluids.values()] };
}

/**
 * What a new record's form starts from: the tasks, their labour summed (hours), their lines, and
 * the machine's open plans that already cover one of them (so the form can offer to complete one).
 */
export async function prefillRecord(access: OrgAccess, machine: Machine, taskIds: string[]) {
  const tasks = await resolveTasks(access, machine, taskIds);
  const estimatedLabourHours =
    Math.round(tasks.reduce((s, t) => s + (t.labourHours ?? 0), 0) * 100) / 100;
  const plannedVisits = await plannedVisitsCovering(
    access.organization.id,
    machine.id,
    tasks.map((t) => t.id),
  );
  return { tasks, estimatedLabourHours, ...prefillLines(tasks), plannedVisits };
}

/**
 * Records a visit: a plan (date + tasks), or a completed service in one transaction — the meter
 * reading, the task resets, parts, measurements and the defects it closes; all or nothing.
 */
export async function createRecord(
  access: OrgAccess,
  machine: Machine,
  input: ServiceRecordCreateInput,
): Promise<{ record: ServiceRecord; resets: TaskReset[] }> {
  refuseDealerDefects(access, input.closesDefectIds);
  const tasks = await resolveTasks(access, machine, input.taskIds);
  await checkTechnicians(access, input.technicianIds);
  const prefilled = prefillLines(tasks);
  const completed = input.status === 'completed';
  if (completed) {
    checkPerformedOn(access, input.performedOn!);
    checkReassembly(input.reassemblySettings, input.unrestoredReason);
  } else await checkDefectsActive(access, machine, input.closesDefectIds);
  const fields = {
    organizationId: access.organization.id,
    machineId: machine.id,
    plannedFor: input.plannedFor,
    tasks: snapshotTasks(tasks),
    technicianIds:
      completed && !input.technicianIds.length
        ? [access.userId]
        : [...new Set(input.technicianIds)],
    labourHours: input.labourHours,
    parts: input.parts ?? prefilled.parts,
    fluids: input.fluids ?? prefilled.fluids,
    otherCosts: input.otherCosts,
    notes: input.notes,
    reassemblySettings: input.reassemblySettings,
    unrestoredReason: input.unrestoredReason,
    defectIds: [...new Set(input.closesDefectIds)],
    createdBy: access.userId,
  };
  return sequelize.transaction(async (transaction) => {
    if (!completed) {
      const record = await ServiceRecord.create(
        {
          ...fields,
          status: 'planned',
          performedOn: null,
          meterValue: null,
          meterLifetime: null,
          readingId: null,
          completedBy: null,
          completedAt: null,
        },
        { transaction },
      );
      await replaceMeasurements(record, input.measurements, transaction);
      await auditRecord(
        access,
        'service.plan',
        record,
        { plannedFor: record.plannedFor },
        transaction,
      );
      return { record, resets: [] };
    }
    const performedOn = input.performedOn!;
    const takenAt = meterTime(access, performedOn, input.meterReadAt);
    const reading = await serviceReading(access, machine, input.meterValue!, takenAt, transaction);
    const record = await ServiceRecord.create(
      {
        ...fields,
        status: 'completed',
        performedOn,
        meterValue: input.meterValue!,
        meterLifetime: reading.lifetimeValue,
        readingId: reading.id,
        completedBy: access.userId,
        completedAt: new Date(),
      },
      { transaction },
    );
    await replaceMeasurements(record, input.measurements, transaction);
    const resets = await resetTasks(
      access,
      machine,
      tasks,
      reading.lifetimeValue,
      performedOn,
      transaction,
    );
    await closeDefects(
      access,
      machine,
      input.closesDefectIds,
      { note: '', serviceRecordId: record.id },
      transaction,
      'closesDefectIds',
    );
    await auditRecord(
      access,
      'service.complete',
      record,
      { performedOn, meterValue: record.meterValue, taskIds: tasks.map((t) => t.id) },
      transaction,
    );
    return { record, resets };
  });
}
