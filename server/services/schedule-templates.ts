// Schedule templates: a farm's reusable lists of service tasks per machine category.
import { sequelize } from '../db';
import { notFound } from '../errors';
import { ScheduleTemplate, type Machine } from '../models';
import type { MachineCategory } from '../../shared/constants';
import type { ScheduleTemplateCreateInput } from '../../shared/schemas/schedule';
import type { OrgAccess } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { addTasks } from './schedules';

/** The organization's templates (optionally of one category), by category and name. */
export async function listTemplates(access: OrgAccess, category?: MachineCategory) {
  return ScheduleTemplate.findAll({
    where: {
      organizationId: access.organization.id,
      ...(category && { category }),
    },
    order: [
      ['category', 'ASC'],
      ['name', 'ASC'],
    ],
  });
}

/** Creates a template; audited. */
export async function createTemplate(access: OrgAccess, input: ScheduleTemplateCreateInput) {
  return sequelize.transaction(async (transaction) => {
    const row = await ScheduleTemplate.create(
      { ...input, organizationId: access.organization.id },
      { transaction },
    );
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'template.create',
        entityType: 'schedule_template',
        entityId: row.id,
      },
      transaction,
    );
    return row;
  });
}

export async function loadTemplate(access: OrgAccess, id: string) {
  const t = await ScheduleTemplate.findOne({
    where: { id, organizationId: access.organization.id },
  });
  if (!t) throw notFound('Schedule template');
  return t;
}

/** Applies a template: creates all its tasks on the machine in one transaction. */
export async function applyTemplate(
  access: OrgAccess,
  machine: Machine,
  template: ScheduleTemplate,
) {
  return addTasks(access, machine, template.tasks, 'task.create_from_template');
}
