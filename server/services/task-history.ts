import { Op } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { MachineForecast, ServiceTask, TaskDuePoint, type Machine } from '../models';
import { todayIso } from '../../shared/domain';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import { recomputeDuePoints } from './forecast';

/** The machine's tasks whose last service nobody has given yet (status history_unknown). */
export async function unknownHistoryTasks(access: OrgAccess, machineId: string) {
  const due = await TaskDuePoint.findAll({
    where: { organizationId: access.organization.id, machineId, status: 'history_unknown' },
    attributes: ['taskId'],
  });
  if (!due.length) return [];
  return ServiceTask.findAll({
    where: {
      organizationId: access.organization.id,
      machineId,
      id: { [Op.in]: due.map((d) => d.taskId) },
    },
  });
}

/**
 * "Start counting from now" for tasks whose last service is not known: each counts its interval
 * from the latest reading and today, without pretending a service was done. One transaction;
 * refused (422) while the machine has no reading to count from.
 */
export async function countFromNow(access: OrgAccess, machine: Machine, tasks: ServiceTask[]) {
  // tasks on several meters count each from its own meter's last reading
  const meterIds = [...new Set(tasks.map((t) => t.meterId))];
  const forecasts = await MachineForecast.findAll({
    where: { organizationId: access.organization.id, meterId: { [Op.in]: meterIds } },
  });
  const lastOf = new Map(forecasts.map((f) => [f.meterId, f.lastValue]));
  if (meterIds.some((id) => lastOf.get(id) == null))
    throw invalid({
      task: `${machine.fleetNumber} has no meter reading yet; log one first, then count from it`,
    });
  const countFromOn = todayIso(access.organization.timeZone);
  await sequelize.transaction(async (transaction) => {
    for (const task of tasks) {
      const countFromMeter = lastOf.get(task.meterId)!;
      await task.update({ countFromMeter, countFromOn, historyUnknown: false }, { transaction });
      await recordAudit(
        {
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'task.count_from_now',
          entityType: 'service_task',
          entityId: task.id,
          changes: { machineId: machine.id, name: task.name, countFromMeter, countFromOn },
        },
        transaction,
      );
    }
    await recomputeDuePoints(access.organization.id, [machine.id], {
      transaction,
      timeZone: access.organization.timeZone,
    });
  });
  return tasks;
}

/** Counts one task from now; refused (422) when its last service is recorded already. */
export async function countTaskFromNow(access: OrgAccess, machine: Machine, task: ServiceTask) {
  if (task.lastDoneMeter !== null || task.lastDoneOn !== null)
    throw invalid({
      task: `${task.name} has a recorded last service; counting starts from it`,
    });
  return countFromNow(access, machine, [task]);
}

/** Counts every task of the machine whose history is unknown from now; 422 when there is none. */
export async function countMachineFromNow(access: OrgAccess, machine: Machine) {
  const tasks = await unknownHistoryTasks(access, machine.id);
  if (!tasks.length)
    throw invalid({ task: `No task of ${machine.fleetNumber} is waiting for its history` });
  return countFromNow(access, machine, tasks);
}
