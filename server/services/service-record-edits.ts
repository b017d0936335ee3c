import { sequelize } from '../db';
import { AppError, invalid } from '../errors';
import type { ServiceRecordUpdateInput } from '../../shared/schemas/service-records';
import type { OrgAccess } from '../policies/access';
import { canHandleDefects } from '../policies/defect';
import { loadRecord } from './service-records';
import {
  checkDefectsActive,
  checkReassembly,
  checkTechnicians,
  refuseDealerDefects,
  resolveTasks,
} from './service-record-checks';
import { auditRecord, replaceMeasurements, snapshotTasks } from './service-record-writes';

// Changes to a saved record: editing a plan (or a completed record's costs and notes), cancelling a plan.

const FIXED_AFTER_COMPLETION = {
  taskIds: "A completed record's tasks cannot change: they have reset the schedule",
  closesDefectIds: "A completed record's defects cannot change: close others from the defect list",
  plannedFor: "A completed record's booking date cannot change",
} as const;

const sameSet = (a: string[], b: string[]) =>
  new Set(a).size === new Set(b).size && a.every((x) => b.includes(x));

/** Edits a plan freely; a completed record's costs, notes, measurements and settings only. */
export async function updateRecord(
  access: OrgAccess,
  recordId: string,
  input: ServiceRecordUpdateInput,
) {
  refuseDealerDefects(access, input.closesDefectIds);
  if (input.closesDefectIds && !canHandleDefects(access)) {
    // a dealer's form sends the (empty) list it was given: that changes nothing
    const { closesDefectIds: _none, ...rest } = input;
    input = rest;
  }
  const { record: found, machine } = await loadRecord(access, recordId);
  if (found.status === 'cancelled')
    throw new AppError(409, 'cancelled', 'This record is cancelled; it cannot change');
  if (found.status === 'completed') {
    // A form sent back whole repeats these unchanged; only a change is refused.
    const changed = {
      taskIds:
        input.taskIds !== undefined &&
        !sameSet(
          input.taskIds,
          found.tasks.map((t) => t.taskId),
        ),
      closesDefectIds:
        input.closesDefectIds !== undefined && !sameSet(input.closesDefectIds, found.defectIds),
      plannedFor: input.plannedFor !== undefined && input.plannedFor !== found.plannedFor,
    };
    const fields: Record<string, string> = {};
    for (const [k, message] of Object.entries(FIXED_AFTER_COMPLETION))
      if (changed[k as keyof typeof changed]) fields[k] = message;
    if (Object.keys(fields).length) throw invalid(fields);
    checkReassembly(
      input.reassemblySettings ?? found.reassemblySettings,
      input.unrestoredReason ?? found.unrestoredReason,
    );
    const { taskIds: _t, closesDefectIds: _d, plannedFor: _p, ...editable } = input;
    input = editable;
  }
  if (input.plannedFor === null) throw invalid({ plannedFor: 'A plan needs its booking date' });
  const tasks = input.taskIds ? await resolveTasks(access, machine, input.taskIds) : null;
  if (input.technicianIds) await checkTechnicians(access, input.technicianIds);
  if (input.closesDefectIds) await checkDefectsActive(access, machine, input.closesDefectIds);
  // A PATCH writes only what it names: new tasks do not rewrite parts or fluids (a new record
  // prefills them; an edit sends its own lines).
  const { measurements, closesDefectIds, taskIds: _taskIds, ...rest } = input;
  const record = found;
  return sequelize.transaction(async (transaction) => {
    await record.update(
      {
        ...rest,
        ...(rest.technicianIds && { technicianIds: [...new Set(rest.technicianIds)] }),
        ...(tasks && { tasks: snapshotTasks(tasks) }),
        ...(closesDefectIds && { defectIds: [...new Set(closesDefectIds)] }),
      },
      { transaction },
    );
    if (measurements) await replaceMeasurements(record, measurements, transaction);
    await auditRecord(
      access,
      'service.update',
      record,
      { fields: Object.keys(input) },
      transaction,
    );
    return { record, machine };
  });
}

export async function cancelRecord(access: OrgAccess, recordId: string) {
  return sequelize.transaction(async (transaction) => {
    const { record, machine } = await loadRecord(access, recordId, transaction);
    if (record.status !== 'planned')
      throw new AppError(
        409,
        'not_planned',
        `This record is ${record.status}; only a plan can be cancelled`,
      );
    await record.update({ status: 'cancelled' }, { transaction });
    await auditRecord(access, 'service.cancel', record, {}, transaction);
    return { record, machine };
  });
}
