import { Op } from 'sequelize';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/context';
import { canViewMachine } from '../policies/machine';
import { operatorIdsOf } from './machines';

/** The machines a person may pick for their digest: those they see, sold ones aside. */
export async function digestMachineChoices(access: OrgAccess) {
  const machines = await Machine.findAll({
    where: { organizationId: access.organization.id, status: { [Op.ne]: 'sold' } },
    attributes: ['id', 'fleetNumber', 'name', 'category', 'organizationId', 'status'],
    order: [['fleetNumber', 'ASC']],
  });
  const operators = await operatorIdsOf(
    machines.map((m) => m.id),
    access.organization.id,
  );
  return machines
    .filter((m) => canViewMachine(access, m, operators.get(m.id) ?? []))
    .map((m) => ({ id: m.id, fleetNumber: m.fleetNumber, name: m.name, category: m.category }));
}
