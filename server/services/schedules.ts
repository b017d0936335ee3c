import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid, notFound } from '../errors';
import { Machine, MachineForecast, MachineMeter, ServiceTask, TaskDuePoint } from '../models';
import { meterNotFound } from './meter-changes';
import type { LastDoneInput, StoredTaskInput, TaskInput } from '../../shared/schemas/schedule';
import { taskTimingProblems, type TaskTiming } from '../../shared/schemas/task-season';
import { todayIso } from '../../shared/domain';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import { recomputeDuePoints } from './forecast';

export async function loadTask(access: OrgAccess, taskId: string, transaction?: Transaction) {
  const task = await ServiceTask.findOne({
    where: { id: taskId, organizationId: access.organization.id },
    transaction,
  });
  if (!task) throw notFound('Task');
  return task;
}

async function audit(
  access: OrgAccess,
  action: string,
  task: ServiceTask,
  changes: object,
  transaction: Transaction,
) {
  await recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action,
      entityType: 'service_task',
      entityId: task.id,
      changes: { machineId: task.machineId, name: task.name, ...changes },
    },
    transaction,
  );
}

const refresh = (access: OrgAccess, machineId: string, transaction: Transaction) =>
  recomputeDuePoints(access.organization.id, [machineId], {
    transaction,
    timeZone: access.organization.timeZone,
  });

/** A task's meter must be one of its machine's (404 naming meterId otherwise). */
async function checkTaskMeter(
  machineId: string,
  meterId: string | undefined,
  transaction?: Transaction,
) {
  if (!meterId) return;
  const found = await MachineMeter.count({ where: { id: meterId, machineId }, transaction });
  if (!found) throw meterNotFound();
}

/**
 * Adds tasks to a machine in one transaction (the caller's, if given) and refreshes its due
 * points; each on the meter it names, else the machine's primary.
 */
export async function addTasks(
  access: OrgAccess,
  machine: Machine,
  inputs: (StoredTaskInput & { meterId?: string })[],
  action = 'task.create',
  outer?: Transaction,
): Promise<ServiceTask[]> {
  if (!outer) return sequelize.transaction((t) => addTasks(access, machine, inputs, action, t));
  const transaction = outer;
  const start = await ServiceTask.count({
    where: { organizationId: access.organization.id, machineId: machine.id },
    transaction,
  });
  const tasks: ServiceTask[] = [];
  for (const meterId of new Set(inputs.map((i) => i.meterId)))
    await checkTaskMeter(machine.id, meterId, transaction);
  for (const [i, input] of inputs.entries()) {
    const task = await ServiceTask.create(
      {
        ...input,
        organizationId: access.organization.id,
        machineId: machine.id,
        lastDoneMeter: null,
        lastDoneOn: null,
        // no last service given: "history unknown" if the machine came with hours
        historyUnknown: true,
        position: start + i,
      },
      { transaction },
    );
    await audit(access, action, task, {}, transaction);
    tasks.push(task);
  }
  await refresh(access, machine.id, transaction);
  return tasks;
}

/** The task's timing as it would stand with the fields sent merged into the stored ones. */
function timingAfter(task: ServiceTask, input: Partial<TaskInput>): TaskTiming {
  const after = <K extends keyof TaskTiming>(key: K): TaskTiming[K] =>
    input[key] !== undefined ? (input[key] as TaskTiming[K]) : (task[key] ?? null);
  return {
    intervalMeter: after('intervalMeter'),
    intervalDays: after('intervalDays'),
    seasonAnchor: after('seasonAnchor'),
    seasonOffsetDays: after('seasonOffsetDays'),
  };
}

export async function updateTask(
  access: OrgAccess,
  task: ServiceTask,
  input: Partial<TaskInput> & { meterId?: string },
) {
  // e.g. a season sent to a task that keeps its day interval: 422 naming intervalDays
  const problems = taskTimingProblems(timingAfter(task, input));
  if (Object.keys(problems).length) throw invalid(problems);
  await checkTaskMeter(task.machineId, input.meterId);
  return sequelize.transaction(async (transaction) => {
    const before = Object.fromEntries(
      Object.keys(input).map((k) => [k, task.get(k as keyof ServiceTask)]),
    );
    await task.update(input, { transaction });
    await audit(access, 'task.update', task, { before, after: input }, transaction);
    await refresh(access, task.machineId, transaction);
    return task;
  });
}

export async function deleteTask(access: OrgAccess, task: ServiceTask) {
  await sequelize.transaction(async (transaction) => {
    await task.destroy({ transaction });
    await audit(access, 'task.delete', task, {}, transaction);
  });
}

/** What is wrong with a last-done entry: a date after today, a meter above the latest reading. */
export function lastDoneProblems(
  input: LastDoneInput,
  today: string,
  latestValue: number | null,
): Partial<Record<keyof LastDoneInput, string>> {
  const problems: Partial<Record<keyof LastDoneInput, string>> = {};
  if (input.lastDoneOn > today) problems.lastDoneOn = `The date may not be after today (${today})`;
  if (latestValue != null && input.lastDoneMeter > latestValue)
    problems.lastDoneMeter = `The meter value may not be above the latest reading (${latestValue.toLocaleString('en-US')})`;
  return problems;
}

/** Stores a checked last-done entry in the caller's transaction (it answers an unknown history). */
export async function recordLastDone(
  access: OrgAccess,
  task: ServiceTask,
  input: LastDoneInput,
  transaction: Transaction,
) {
  const before = { lastDoneMeter: task.lastDoneMeter, lastDoneOn: task.lastDoneOn };
  await task.update(
    { ...input, historyUnknown: false, countFromMeter: null, countFromOn: null },
    { transaction },
  );
  await audit(access, 'task.last_done', task, { before, after: input }, transaction);
}

/** Sets when a task was last done before the machine came into the system. */
export async function setLastDone(access: OrgAccess, task: ServiceTask, input: LastDoneInput) {
  const forecast = await MachineForecast.findByPk(task.meterId);
  const problems = lastDoneProblems(
    input,
    todayIso(access.organization.timeZone),
    forecast?.lastValue ?? null,
  );
  if (Object.keys(problems).length) throw invalid(problems);
  return sequelize.transaction(async (transaction) => {
    await recordLastDone(access, task, input, transaction);
    await refresh(access, task.machineId, transaction);
    return task;
  });
}

/** A task's stored due point, or null before the first computation. */
export async function dueOfTask(task: ServiceTask) {
  const due = await TaskDuePoint.findByPk(task.id);
  return due?.due ?? null;
}

/** The stored due points of these tasks of one organization, by task id. */
export async function dueOfTasks(organizationId: string, taskIds: string[]) {
  const due = await TaskDuePoint.findAll({ where: { organizationId, taskId: taskIds } });
  return new Map(due.map((d) => [d.taskId, d.due]));
}

/** A machine's tasks in schedule order (position, then name), each with its stored due point. */
export async function machineTasksWithDue(access: OrgAccess, machineId: string) {
  const organizationId = access.organization.id;
  const [tasks, due] = await Promise.all([
    ServiceTask.findAll({
      where: { organizationId, machineId },
      order: [
        ['position', 'ASC'],
        ['name', 'ASC'],
      ],
    }),
    TaskDuePoint.findAll({ where: { organizationId, machineId } }),
  ]);
  const dueOf = new Map(due.map((d) => [d.taskId, d.due]));
  return tasks.map((task) => ({ task, due: dueOf.get(task.id) ?? null }));
}
