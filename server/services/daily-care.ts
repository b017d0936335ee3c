// Daily care (issue 11): grease rounds and daily items the operator signs off inside the
// walkaround. A tick resets exactly that task to the walkaround's meter (on the lifetime scale)
// and local date, with an audit entry naming the walkaround, and no service record. It travels
// inside the walkaround's submission, so the walkaround's clientId makes a resend change nothing.
import { Op, type Transaction } from 'sequelize';
import { invalid } from '../errors';
import { MachineForecast, ServiceTask, TaskDuePoint, type Machine } from '../models';
import { todayIso } from '../../shared/domain';
import { careState } from '../../shared/domain/daily-care';
import type { CareSignedOff, DailyCareItem } from '../../shared/schemas/daily-care';
import type { Hazard } from '../../shared/schemas/schedule';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import { recomputeDuePoints } from './forecast';

const round2 = (n: number) => Math.round(n * 100) / 100;

/** Each machine's daily-care tasks (in schedule order) and where each stands today, by machine. */
export async function dailyCareOf(
  organizationId: string,
  timeZone: string,
  machineIds: string[],
  options: { now?: Date; transaction?: Transaction } = {},
): Promise<Map<string, DailyCareItem[]>> {
  const { transaction } = options;
  const out = new Map<string, DailyCareItem[]>();
  if (!machineIds.length) return out;
  const tasks = await ServiceTask.findAll({
    where: { organizationId, machineId: { [Op.in]: machineIds }, dailyCare: true },
    order: [
      ['position', 'ASC'],
      ['createdAt', 'ASC'],
    ],
    transaction,
  });
  if (!tasks.length) return out;
  const [points, forecasts] = await Promise.all([
    TaskDuePoint.findAll({
      where: { organizationId, taskId: { [Op.in]: tasks.map((t) => t.id) } },
      attributes: ['taskId', 'status'],
      transaction,
    }),
    MachineForecast.findAll({
      where: { organizationId, meterId: { [Op.in]: [...new Set(tasks.map((t) => t.meterId))] } },
      attributes: ['meterId', 'lastValue'],
      transaction,
    }),
  ]);
  const statusOf = new Map(points.map((p) => [p.taskId, p.status]));
  // each task counts on its own meter's last reading
  const lastValueOf = new Map(forecasts.map((f) => [f.meterId, f.lastValue]));
  const today = todayIso(timeZone, options.now);
  for (const task of tasks) {
    const last = lastValueOf.get(task.meterId) ?? null;
    const item: DailyCareItem = {
      taskId: task.id,
      name: task.name,
      intervalMeter: task.intervalMeter,
      intervalDays: task.intervalDays,
      instructions: task.instructions,
      // the column holds only what the task schema let in
      hazards: task.hazards as Hazard[],
      lastDoneMeter: task.lastDoneMeter,
      lastDoneOn: task.lastDoneOn,
      sinceMeter:
        last !== null && task.lastDoneMeter !== null ? round2(last - task.lastDoneMeter) : null,
      state: careState(statusOf.get(task.id) ?? null, task.lastDoneOn, today),
    };
    out.set(task.machineId, [...(out.get(task.machineId) ?? []), item]);
  }
  return out;
}

/**
 * The tasks a walkaround ticked done, locked for the update. Each id must be one of this
 * machine's daily-care tasks, once; otherwise 422 naming `careDone.<index>` and nothing is written
 * (a task of another machine or farm reads as unknown, so nothing about it is told).
 */
export async function checkCareDone(
  access: OrgAccess,
  machine: Machine,
  ids: string[],
  transaction: Transaction,
): Promise<ServiceTask[]> {
  if (!ids.length) return [];
  const tasks = await ServiceTask.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: ids } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  const byId = new Map(tasks.map((t) => [t.id, t]));
  const errors: Record<string, string> = {};
  const seen = new Set<string>();
  ids.forEach((id, i) => {
    const task = byId.get(id);
    if (!task || task.machineId !== machine.id)
      errors[`careDone.${i}`] = `No daily-care task of ${machine.fleetNumber} has this id`;
    else if (!task.dailyCare)
      errors[`careDone.${i}`] =
        `"${task.name}" is not daily care: it is signed off with a service record`;
    else if (seen.has(id)) errors[`careDone.${i}`] = `"${task.name}" is ticked twice`;
    seen.add(id);
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return ids.map((id) => byId.get(id)!);
}

/**
 * What signing off each task does: reset it to the walkaround, unless it was done after it (a
 * walkaround that waited in a phone's outbox never moves a task back). Lifetime meter, ISO date.
 */
export function planCare(
  tasks: Pick<ServiceTask, 'id' | 'name' | 'lastDoneMeter' | 'lastDoneOn'>[],
  lifetime: number,
  doneOn: string,
): CareSignedOff[] {
  return tasks.map((t) => ({
    taskId: t.id,
    name: t.name,
    reset: !(
      (t.lastDoneOn !== null && t.lastDoneOn > doneOn) ||
      (t.lastDoneMeter !== null && t.lastDoneMeter > lifetime)
    ),
  }));
}

/**
 * Signs off the planned tasks for the walkaround, in its transaction: each reset one gets the
 * walkaround's lifetime meter and local date; each ticked one an audit entry (who: the caller;
 * which walkaround); then the machine's due points are recomputed, as after a service.
 */
export async function signOffCare(
  access: OrgAccess,
  machine: Machine,
  walkaroundId: string,
  tasks: ServiceTask[],
  plan: CareSignedOff[],
  done: { lifetime: number; on: string },
  transaction: Transaction,
): Promise<void> {
  if (!tasks.length) return;
  for (const [i, task] of tasks.entries()) {
    const before = { lastDoneMeter: task.lastDoneMeter, lastDoneOn: task.lastDoneOn };
    if (plan[i].reset)
      await task.update(
        { lastDoneMeter: done.lifetime, lastDoneOn: done.on, historyUnknown: false },
        { transaction },
      );
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'task.daily_care_done',
        entityType: 'service_task',
        entityId: task.id,
        changes: {
          machineId: machine.id,
          name: task.name,
          walkaroundId,
          reset: plan[i].reset,
          before,
          after: plan[i].reset ? { lastDoneMeter: done.lifetime, lastDoneOn: done.on } : before,
        },
      },
      transaction,
    );
  }
  await recomputeDuePoints(access.organization.id, [machine.id], {
    transaction,
    timeZone: access.organization.timeZone,
  });
}
