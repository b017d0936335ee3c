import { UniqueConstraintError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid, notFound } from '../errors';
import { ChecklistTemplate, type Machine } from '../models';
import type { ChecklistItem } from '../models/walkaround';
import type { MachineCategory } from '../../shared/constants';
import type {
  ChecklistItemInput,
  ChecklistTemplateCreateInput,
  ChecklistTemplateUpdateInput,
} from '../../shared/schemas/walkarounds';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import { builtInChecklist, itemsForMachine } from './checklist-defaults';
import { cautionFor } from './checklist-items';

// The walkaround checklists: the farm's template of a machine category (one each), else the
// built-in list; of either, the items for every machine of the category and those of its class.

export interface Checklist {
  template: {
    id: string | null;
    name: string;
    description: string;
    source: 'farm' | 'built_in';
  };
  items: ChecklistItem[];
}

/**
 * The checklist a machine's walkaround follows: the farm's template of its category, else the
 * built-in one, narrowed to the machine's class (itemsForMachine), before-start items first.
 */
export async function checklistFor(
  access: OrgAccess,
  machine: Pick<Machine, 'category' | 'machineClass'>,
  transaction?: Transaction,
): Promise<Checklist> {
  const { category } = machine;
  const machineClass = machine.machineClass ?? null;
  const template = await ChecklistTemplate.findOne({
    where: { organizationId: access.organization.id, category },
    transaction,
  });
  if (template)
    return {
      template: {
        id: template.id,
        name: template.name,
        description: template.description,
        source: 'farm',
      },
      items: itemsForMachine(template.items, machineClass),
    };
  const builtIn = builtInChecklist(category);
  return {
    template: {
      id: null,
      name: builtIn.name,
      description: builtIn.description,
      source: 'built_in',
    },
    items: itemsForMachine(builtIn.items, machineClass),
  };
}

const slug = (label: string) =>
  label
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 50) || 'item';

/** Template items as stored: ids kept or made from the label, unique; cautions filled from the hazards. */
export function normaliseItems(items: ChecklistItemInput[]): ChecklistItem[] {
  const seen = new Set<string>();
  const errors: Record<string, string> = {};
  const out = items.map((input, i) => {
    let id = input.id ?? slug(input.label);
    if (input.id && seen.has(id)) errors[`items.${i}.id`] = `Item id ${id} is used twice`;
    for (let n = 2; !input.id && seen.has(id); n += 1) id = `${slug(input.label)}-${n}`;
    seen.add(id);
    return {
      id,
      label: input.label,
      guidance: input.guidance,
      critical: input.critical,
      hazards: input.hazards,
      caution: input.caution || cautionFor(input.hazards),
      phase: input.phase,
      classes: [...new Set(input.classes)],
    };
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return out;
}

const categoryTaken = (category: string) =>
  invalid({
    category: `This farm has a ${category} checklist already; edit that one (one checklist per category)`,
  });

/** The farm's checklist templates (of one category when given), by category. */
export async function listChecklistTemplates(access: OrgAccess, category?: MachineCategory) {
  return ChecklistTemplate.findAll({
    where: {
      organizationId: access.organization.id,
      ...(category && { category }),
    },
    order: [['category', 'ASC']],
  });
}

export async function loadChecklistTemplate(access: OrgAccess, id: string) {
  const t = await ChecklistTemplate.findOne({
    where: { id, organizationId: access.organization.id },
  });
  if (!t) throw notFound('Checklist template');
  return t;
}

export async function createChecklistTemplate(
  access: OrgAccess,
  input: ChecklistTemplateCreateInput,
) {
  const items = normaliseItems(input.items);
  try {
    return await sequelize.transaction(async (transaction) => {
      const t = await ChecklistTemplate.create(
        { ...input, items, organizationId: access.organization.id },
        { transaction },
      );
      await recordAudit(
        {
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'checklist.create',
          entityType: 'checklist_template',
          entityId: t.id,
          changes: { category: t.category, name: t.name, items: items.length },
        },
        transaction,
      );
      return t;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw categoryTaken(input.category);
    throw err;
  }
}

export async function updateChecklistTemplate(
  access: OrgAccess,
  template: ChecklistTemplate,
  input: ChecklistTemplateUpdateInput,
) {
  const { items: given, ...fields } = input;
  const items = given ? normaliseItems(given) : undefined;
  try {
    return await sequelize.transaction(async (transaction) => {
      const before = { category: template.category, name: template.name };
      await template.update({ ...fields, ...(items && { items }) }, { transaction });
      await recordAudit(
        {
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'checklist.update',
          entityType: 'checklist_template',
          entityId: template.id,
          changes: { before, fields: Object.keys(input) },
        },
        transaction,
      );
      return template;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw categoryTaken(input.category ?? '');
    throw err;
  }
}

export async function deleteChecklistTemplate(access: OrgAccess, template: ChecklistTemplate) {
  await sequelize.transaction(async (transaction) => {
    await template.destroy({ transaction });
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'checklist.delete',
        entityType: 'checklist_template',
        entityId: template.id,
        changes: { category: template.category, name: template.name },
      },
      transaction,
    );
  });
}
