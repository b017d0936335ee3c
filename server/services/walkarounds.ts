import { randomUUID } from 'node:crypto';
import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError, invalid, notFound } from '../errors';
import { ChecklistTemplate, Defect, Walkaround, WalkaroundPhoto, type Machine } from '../models';
import type { ChecklistItem, WalkaroundItem } from '../models/walkaround';
import type { MachineCategory } from '../../shared/constants';
import type {
  ChecklistItemInput,
  ChecklistTemplateCreateInput,
  ChecklistTemplateUpdateInput,
  WalkaroundCreateInput,
  WalkaroundListQuery,
  WalkaroundPurpose,
} from '../../shared/schemas/walkarounds';
import type { OrgAccess } from '../policies/access';
import { authorize, hasRole } from '../policies/access';
import { canDoWalkaround, canInspect } from '../policies/walkaround';
import { loadMachine } from './machines';
import { writeAccompanyingReading } from './readings';
import { raiseDefect, taggedOutMessage } from './defects';
import { recordAudit } from '../infra/audit';
import { cautionFor, defaultChecklist } from './checklist-defaults';

export interface Checklist {
  template: {
    id: string | null;
    name: string;
    description: string;
    source: 'farm' | 'built_in';
  };
  items: ChecklistItem[];
}

/** The checklist a machine's walkaround follows: the farm's template of its category, else the built-in one. */
export async function checklistFor(
  access: OrgAccess,
  category: MachineCategory,
  transaction?: Transaction,
): Promise<Checklist> {
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
      items: template.items,
    };
  const builtIn = defaultChecklist(category);
  return {
    template: {
      id: null,
      name: builtIn.name,
      description: builtIn.description,
      source: 'built_in',
    },
    items: builtIn.items,
  };
}

/**
 * Why a walkaround may not start on this machine for this purpose, or null. An operator's check
 * before use is refused on a tagged-out machine, in the words the operator must see.
 */
export function walkaroundRefusal(machine: Machine, purpose: WalkaroundPurpose): AppError | null {
  if (machine.status === 'sold')
    return new AppError(
      409,
      'machine_sold',
      `${machine.fleetNumber} is sold; walkarounds are closed`,
    );
  if (purpose === 'use' && machine.status === 'tagged_out')
    return new AppError(409, 'tagged_out', taggedOutMessage(machine));
  return null;
}

/** Checks who may start which walkaround on the machine; throws 403 or 409. */
export function assertMayStart(access: OrgAccess, machine: Machine, purpose: WalkaroundPurpose) {
  authorize(canDoWalkaround(access, machine), 'Your role does not do walkarounds');
  if (purpose === 'inspection')
    authorize(canInspect(access), 'Only a technician or manager records a shop inspection');
  const refusal = walkaroundRefusal(machine, purpose);
  if (refusal) throw refusal;
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
    };
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return out;
}

const categoryTaken = (category: string) =>
  invalid({
    category: `This farm has a ${category} checklist already; edit that one (one checklist per category)`,
  });

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

/** Every item answered once, no unknown item, photos of this machine not used elsewhere. */
async function checkAnswers(
  access: OrgAccess,
  machine: Machine,
  checklist: Checklist,
  answers: WalkaroundCreateInput['items'],
  transaction: Transaction,
): Promise<WalkaroundItem[]> {
  const known = new Map(checklist.items.map((i) => [i.id, i]));
  const errors: Record<string, string> = {};
  const seen = new Set<string>();
  answers.forEach((a, i) => {
    if (!known.has(a.itemId))
      errors[`items.${i}.itemId`] = `No item "${a.itemId}" on the ${checklist.template.name} list`;
    else if (seen.has(a.itemId))
      errors[`items.${i}.itemId`] = `"${known.get(a.itemId)!.label}" is answered twice`;
    seen.add(a.itemId);
  });
  const missing = checklist.items.filter((i) => !seen.has(i.id));
  if (missing.length)
    errors.items = `Answer every item: ${missing.map((i) => `"${i.label}"`).join(', ')} ${missing.length === 1 ? 'is' : 'are'} missing`;
  const photoIds = answers.map((a) => a.photoId).filter((p): p is string => !!p);
  if (photoIds.length) {
    const photos = await WalkaroundPhoto.findAll({
      where: { organizationId: access.organization.id, id: { [Op.in]: photoIds } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const byId = new Map(photos.map((p) => [p.id, p]));
    answers.forEach((a, i) => {
      if (!a.photoId) return;
      const p = byId.get(a.photoId);
      if (!p || p.machineId !== machine.id)
        errors[`items.${i}.photoId`] = `No such photo of ${machine.fleetNumber}; upload it first`;
      else if (p.walkaroundId)
        errors[`items.${i}.photoId`] = 'This photo belongs to another walkaround';
    });
    if (new Set(photoIds).size !== photoIds.length) errors.items ??= 'A photo is attached twice';
  }
  if (Object.keys(errors).length) throw invalid(errors);
  const order = new Map(checklist.items.map((item, i) => [item.id, i]));
  return [...answers]
    .sort((a, b) => order.get(a.itemId)! - order.get(b.itemId)!)
    .map((a) => {
      const item = known.get(a.itemId)!;
      return {
        itemId: a.itemId,
        label: item.label,
        critical: item.critical,
        result: a.result,
        note: a.note,
        photoId: a.photoId,
      };
    });
}

export interface WalkaroundOutcome {
  walkaround: Walkaround;
  machine: Machine;
  created: boolean;
  defectIds: string[];
}

/**
 * Records a walkaround in one transaction: the meter reading (source 'walkaround', the usual
 * rules), the answers, a defect for each fail or attention, and a tag-out for a critical fail.
 * A clientId already used answers the first walkaround again, so a re-sent phone form is not doubled.
 */
export async function submitWalkaround(
  access: OrgAccess,
  input: WalkaroundCreateInput,
): Promise<WalkaroundOutcome> {
  const again = await findByClientId(access, input);
  if (again) return again;
  try {
    return await sequelize.transaction(async (transaction) => {
      const { machine } = await loadMachine(access, input.machineId, transaction);
      await sequelize.query('SELECT id FROM machines WHERE id = :id FOR UPDATE', {
        replacements: { id: machine.id },
        transaction,
      });
      await machine.reload({ transaction });
      assertMayStart(access, machine, input.purpose);
      const checklist = await checklistFor(access, machine.category, transaction);
      const items = await checkAnswers(access, machine, checklist, input.items, transaction);
      const performedAt = input.performedAt ? new Date(input.performedAt) : new Date();
      const reading = await walkaroundReading(
        access,
        machine,
        input.meterValue,
        performedAt,
        transaction,
      );
      const result = items.some((i) => i.result === 'fail')
        ? 'fail'
        : items.some((i) => i.result === 'attention')
          ? 'attention'
          : 'ok';
      const walkaround = await Walkaround.create(
        {
          organizationId: access.organization.id,
          machineId: machine.id,
          operatorId: access.userId,
          clientId: input.clientId,
          purpose: input.purpose,
          performedAt,
          meterValue: input.meterValue,
          readingId: reading?.id ?? null,
          templateId: checklist.template.id,
          templateName: checklist.template.name,
          items,
          result,
          notes: input.notes,
        },
        { transaction },
      );
      const photoIds = items.map((i) => i.photoId).filter((p): p is string => !!p);
      if (photoIds.length)
        await WalkaroundPhoto.update(
          { walkaroundId: walkaround.id },
          {
            where: { organizationId: access.organization.id, id: { [Op.in]: photoIds } },
            transaction,
          },
        );
      const defectIds: string[] = [];
      let taggedOut = false;
      for (const item of items.filter((i) => i.result !== 'ok')) {
        const severity =
          item.result === 'fail' ? (item.critical ? 'critical' : 'major') : ('minor' as const);
        const raised = await raiseDefect(
          access,
          machine,
          {
            title: `${item.label}: ${item.result === 'fail' ? 'fail' : 'needs attention'}`,
            description: item.note,
            severity,
          },
          { walkaroundId: walkaround.id, itemId: item.itemId, photoId: item.photoId },
          transaction,
        );
        defectIds.push(raised.defect.id);
        taggedOut ||= severity === 'critical';
      }
      if (taggedOut) await walkaround.update({ taggedOut: true }, { transaction });
      await recordAudit(
        {
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'walkaround.create',
          entityType: 'walkaround',
          entityId: walkaround.id,
          changes: { machineId: machine.id, result, meterValue: input.meterValue, taggedOut },
        },
        transaction,
      );
      return { walkaround, machine, created: true, defectIds };
    });
  } catch (err) {
    // Two copies of the same submission at once: the second finds the first.
    if (err instanceof UniqueConstraintError) {
      const first = await findByClientId(access, input);
      if (first) return first;
    }
    throw err;
  }
}

async function findByClientId(
  access: OrgAccess,
  input: WalkaroundCreateInput,
): Promise<WalkaroundOutcome | null> {
  const existing = await Walkaround.findOne({
    where: { organizationId: access.organization.id, clientId: input.clientId },
  });
  if (!existing) return null;
  if (existing.machineId !== input.machineId)
    throw new AppError(
      409,
      'client_id_used',
      'This clientId belongs to another walkaround; generate a new one for each walkaround',
      { clientId: 'Used by another walkaround' },
    );
  const { machine } = await loadMachine(access, existing.machineId);
  const defects = await Defect.findAll({
    where: { organizationId: access.organization.id, walkaroundId: existing.id },
    attributes: ['id'],
  });
  return { walkaround: existing, machine, created: false, defectIds: defects.map((d) => d.id) };
}

/** The walkaround's meter reading, through the reading rules (errors on meterValue / performedAt). */
const walkaroundReading = (
  access: OrgAccess,
  machine: Machine,
  value: number,
  takenAt: Date,
  transaction: Transaction,
) =>
  writeAccompanyingReading(
    access,
    { machine, value, takenAt, source: 'walkaround' },
    { value: 'meterValue', takenAt: 'performedAt' },
    transaction,
  );

/** Stores an uploaded walkaround photo (already prepared); the walkaround claims it by id later. */
export async function storeWalkaroundPhoto(access: OrgAccess, machine: Machine, key: string) {
  return WalkaroundPhoto.create({
    id: randomUUID(),
    organizationId: access.organization.id,
    machineId: machine.id,
    walkaroundId: null,
    objectKey: key,
    uploadedBy: access.userId,
  });
}

/** Walkarounds, newest first; operators see those of the machines they may see. */
export async function listWalkarounds(access: OrgAccess, query: WalkaroundListQuery) {
  const where = ['w.organization_id = :org'];
  const replacements: Record<string, unknown> = {
    org: access.organization.id,
    user: access.userId,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  if (query.machineId) {
    where.push('w.machine_id = :machineId');
    replacements.machineId = query.machineId;
  }
  if (query.result) {
    where.push('w.result = :result');
    replacements.result = query.result;
  }
  if (hasRole(access, 'operator')) {
    where.push(`(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = w.organization_id AND o.machine_id = w.machine_id)
      OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = w.organization_id AND o.machine_id = w.machine_id AND o.user_id = :user))`);
  }
  const rows = await sequelize.query<{ id: string; total: string }>(
    `SELECT w.id, count(*) OVER () AS total FROM walkarounds w
     WHERE ${where.join(' AND ')}
     ORDER BY w.performed_at DESC, w.id
     LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const found = await Walkaround.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: rows.map((r) => r.id) } },
  });
  const byId = new Map(found.map((w) => [w.id, w]));
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    walkarounds: rows.map((r) => byId.get(r.id)!),
  };
}
