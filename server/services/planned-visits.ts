import { Op, type Transaction } from 'sequelize';
import { ServiceRecord } from '../models';
import type { PlannedVisit } from '../../shared/schemas/service-record-responses';

// The same work must not be planned twice: recording a service offers to complete the open plan
// that covers its tasks, and a dealer's proposal says which plans it overlaps before the farm
// accepts it. Both ask this one question of the machine's open plans.

/** A plan as the record form and the bookings page show it. */
export const plannedVisitOf = (r: ServiceRecord): PlannedVisit => ({
  id: r.id,
  plannedFor: r.plannedFor!,
  tasks: r.tasks.map((t) => ({ taskId: t.taskId, name: t.name })),
});

/** The open plans of the machines, soonest first (then the oldest booked), by machine id. */
export async function openPlansOf(
  organizationId: string,
  machineIds: string[],
  transaction?: Transaction,
): Promise<Map<string, ServiceRecord[]>> {
  const byMachine = new Map<string, ServiceRecord[]>();
  if (!machineIds.length) return byMachine;
  const plans = await ServiceRecord.findAll({
    where: {
      organizationId,
      machineId: { [Op.in]: [...new Set(machineIds)] },
      status: 'planned',
    },
    order: [
      ['plannedFor', 'ASC'],
      ['createdAt', 'ASC'],
    ],
    transaction,
  });
  for (const p of plans) byMachine.set(p.machineId, [...(byMachine.get(p.machineId) ?? []), p]);
  return byMachine;
}

/** The plans among these that cover one of the tasks, or fall on the date when one is given. */
export function plansOverlapping(
  plans: readonly ServiceRecord[],
  taskIds: readonly string[],
  onDate?: string,
): PlannedVisit[] {
  const wanted = new Set(taskIds);
  return plans
    .filter((p) => p.plannedFor === onDate || p.tasks.some((t) => wanted.has(t.taskId)))
    .map(plannedVisitOf);
}

/** The machine's open plans that cover one of the tasks (none asked: none). */
export async function plannedVisitsCovering(
  organizationId: string,
  machineId: string,
  taskIds: readonly string[],
): Promise<PlannedVisit[]> {
  if (!taskIds.length) return [];
  const plans = await openPlansOf(organizationId, [machineId]);
  return plansOverlapping(plans.get(machineId) ?? [], taskIds);
}
