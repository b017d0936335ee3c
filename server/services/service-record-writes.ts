import type { Transaction } from 'sequelize';
import { ServiceMeasurement, type ServiceRecord, type ServiceTask, type Machine } from '../models';
import type { MeasurementInput } from '../../shared/schemas/service-records';
import type { OrgAccess } from '../policies/access';
import { writeAccompanyingReading } from './readings';
import { recomputeDuePoints } from './forecast';
import { recordAudit } from '../infra/audit';

// What saving a service record writes beside the record itself: its meter reading, the task
// resets and due points, its measurements, the audit entry and the snapshot of its tasks.

/** The service's meter reading, through the reading rules (errors on meterValue / performedOn). */
export const serviceReading = (
  access: OrgAccess,
  machine: Machine,
  value: number,
  takenAt: Date,
  transaction: Transaction,
) =>
  writeAccompanyingReading(
    access,
    { machine, value, takenAt, source: 'service' },
    { value: 'meterValue', takenAt: 'performedOn' },
    transaction,
  );

export interface TaskReset {
  taskId: string;
  name: string;
  reset: boolean;
  lastDoneMeter: number | null;
  lastDoneOn: string | null;
  note: string;
}

/**
 * Resets each task the visit covered to its meter (lifetime scale) and date, then refreshes the
 * machine's due points. A task already done later than this visit keeps its newer point.
 */
export async function resetTasks(
  access: OrgAccess,
  machine: Machine,
  tasks: ServiceTask[],
  lifetime: number,
  performedOn: string,
  transaction: Transaction,
): Promise<TaskReset[]> {
  const out: TaskReset[] = [];
  for (const task of tasks) {
    if (task.lastDoneOn && task.lastDoneOn > performedOn) {
      out.push({
        taskId: task.id,
        name: task.name,
        reset: false,
        lastDoneMeter: task.lastDoneMeter,
        lastDoneOn: task.lastDoneOn,
        note: `Kept: last done ${task.lastDoneOn}, after this visit`,
      });
      continue;
    }
    await task.update({ lastDoneMeter: lifetime, lastDoneOn: performedOn }, { transaction });
    out.push({
      taskId: task.id,
      name: task.name,
      reset: true,
      lastDoneMeter: lifetime,
      lastDoneOn: performedOn,
      note: '',
    });
  }
  if (tasks.length)
    await recomputeDuePoints(access.organization.id, [machine.id], {
      transaction,
      timeZone: access.organization.timeZone,
    });
  return out;
}

/** The record's measurements become the given list, in its order. */
export async function replaceMeasurements(
  record: ServiceRecord,
  measurements: MeasurementInput[],
  transaction: Transaction,
) {
  await ServiceMeasurement.destroy({ where: { serviceRecordId: record.id }, transaction });
  if (!measurements.length) return;
  await ServiceMeasurement.bulkCreate(
    measurements.map((m, position) => ({
      organizationId: record.organizationId,
      machineId: record.machineId,
      serviceRecordId: record.id,
      position,
      ...m,
    })),
    { transaction },
  );
}

/** The audit entry of a change to a service record (its machine named). */
export const auditRecord = (
  access: OrgAccess,
  action: string,
  record: ServiceRecord,
  changes: Record<string, unknown>,
  transaction: Transaction,
) =>
  recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType: 'service_record',
      entityId: record.id,
      changes: { machineId: record.machineId, ...changes },
    },
    transaction,
  );

/** The tasks as a record keeps them: id and name at the time. */
export const snapshotTasks = (tasks: ServiceTask[]) =>
  tasks.map((t) => ({ taskId: t.id, name: t.name }));
