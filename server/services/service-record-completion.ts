import { Op } from 'sequelize';
import { sequelize } from '../db';
import { AppError } from '../errors';
import { Defect, type Machine, type ServiceRecord } from '../models';
import type { ServiceRecordCompleteInput } from '../../shared/schemas/service-records';
import type { OrgAccess } from '../policies/access';
import { canHandleDefects } from '../policies/defect';
import { closeDefects } from './defects';
import { loadRecord, prefillLines } from './service-records';
import {
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

/**
 * Completes a planned record in one transaction, with any changes given on the way. Defects the
 * plan named that were closed meanwhile are skipped; defects named here must still be open. A
 * dealer completing a farm's plan closes none of its defects: they stay open for the farm's shop
 * (and the record names none), and the machine's status never changes here.
 */
export async function completeRecord(
  access: OrgAccess,
  recordId: string,
  input: ServiceRecordCompleteInput,
): Promise<{ record: ServiceRecord; machine: Machine; resets: TaskReset[] }> {
  const { record: current, machine } = await loadRecord(access, recordId);
  if (current.status !== 'planned')
    throw new AppError(
      409,
      'not_planned',
      `This record is ${current.status}; only a plan can be completed`,
    );
  refuseDealerDefects(access, input.closesDefectIds);
  const taskIds = input.taskIds ?? current.tasks.map((t) => t.taskId);
  const tasks = await resolveTasks(access, machine, taskIds);
  if (input.technicianIds) await checkTechnicians(access, input.technicianIds);
  checkPerformedOn(access, input.performedOn);
  const settings = input.reassemblySettings ?? current.reassemblySettings;
  const reason = input.unrestoredReason ?? current.unrestoredReason;
  checkReassembly(settings, reason);
  return sequelize.transaction(async (transaction) => {
    const { record } = await loadRecord(access, recordId, transaction);
    if (record.status !== 'planned')
      throw new AppError(409, 'not_planned', `This record is ${record.status} already`);
    let defectIds = input.closesDefectIds;
    if (!canHandleDefects(access)) defectIds = [];
    else if (!defectIds) {
      const stillOpen = await Defect.findAll({
        where: {
          organizationId: access.organization.id,
          id: { [Op.in]: record.defectIds },
          status: { [Op.ne]: 'fixed' },
        },
        attributes: ['id'],
        transaction,
      });
      const open = new Set(stillOpen.map((d) => d.id));
      defectIds = record.defectIds.filter((id) => open.has(id));
    }
    const takenAt = meterTime(access, input.performedOn, input.meterReadAt);
    const reading = await serviceReading(access, machine, input.meterValue, takenAt, transaction);
    const changedTasks = input.taskIds !== undefined;
    const prefilled = changedTasks ? prefillLines(tasks) : null;
    const technicianIds = input.technicianIds ?? record.technicianIds;
    await record.update(
      {
        status: 'completed',
        performedOn: input.performedOn,
        meterValue: input.meterValue,
        meterLifetime: reading.lifetimeValue,
        readingId: reading.id,
        tasks: snapshotTasks(tasks),
        technicianIds: technicianIds.length ? [...new Set(technicianIds)] : [access.userId],
        labourHours: input.labourHours !== undefined ? input.labourHours : record.labourHours,
        parts: input.parts ?? prefilled?.parts ?? record.parts,
        fluids: input.fluids ?? prefilled?.fluids ?? record.fluids,
        otherCosts: input.otherCosts ?? record.otherCosts,
        notes: input.notes ?? record.notes,
        reassemblySettings: settings,
        unrestoredReason: reason,
        defectIds,
        completedBy: access.userId,
        completedAt: new Date(),
      },
      { transaction },
    );
    if (input.measurements) await replaceMeasurements(record, input.measurements, transaction);
    const resets = await resetTasks(
      access,
      machine,
      tasks,
      reading.lifetimeValue,
      input.performedOn,
      transaction,
    );
    await closeDefects(
      access,
      machine,
      defectIds,
      { note: '', serviceRecordId: record.id },
      transaction,
      'closesDefectIds',
    );
    await auditRecord(
      access,
      'service.complete',
      record,
      {
        performedOn: input.performedOn,
        meterValue: input.meterValue,
        taskIds: tasks.map((t) => t.id),
      },
      transaction,
    );
    return { record, machine, resets };
  });
}
