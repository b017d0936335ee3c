// What one machine's page shows beside its record: the stored forecast and the worst and next
// due of its tasks.
import { Op } from 'sequelize';
import { ServiceTask, TaskDuePoint, type Machine } from '../models';
import { primaryForecastOf } from './primary-forecast';
import type { OrgAccess } from '../policies/context';

// Worst first: the status a machine shows is the worst of its tasks'.
const STATUS_RANK = { overdue: 0, due_soon: 1, history_unknown: 2, no_forecast: 3, ok: 4 } as const;

/** The machine's stored forecast summary, or null before its first reading. */
export const forecastOf = (machine: Machine) => primaryForecastOf(machine);

/**
 * The forecast, the worst due status of the machine's service tasks and their earliest due date
 * (daily care, signed off in the walkaround, is left out as on the due list).
 */
export async function machineDueSummary(access: OrgAccess, machine: Machine) {
  const forecast = await forecastOf(machine);
  const where = { organizationId: access.organization.id, machineId: machine.id };
  const care = await ServiceTask.findAll({
    where: { ...where, dailyCare: true },
    attributes: ['id'],
  });
  const due = await TaskDuePoint.findAll({
    where: care.length ? { ...where, taskId: { [Op.notIn]: care.map((t) => t.id) } } : where,
  });
  const worst = [...due].sort((a, b) => STATUS_RANK[a.status] - STATUS_RANK[b.status])[0];
  const nextDueDate =
    due
      .map((d) => d.sortDate)
      .filter((d): d is string => !!d)
      .sort()[0] ?? null;
  return { forecast, dueStatus: worst?.status ?? null, nextDueDate };
}
