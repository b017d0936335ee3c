import { Op, type Transaction } from 'sequelize';
import { invalid } from '../errors';
import { WalkaroundPhoto, type Machine } from '../models';
import type { WalkaroundItem } from '../models/walkaround';
import type { WalkaroundCreateInput } from '../../shared/schemas/walkarounds';
import type { OrgAccess } from '../policies/access';
import type { Checklist } from './checklist-templates';

/** Every item answered once, no unknown item, photos of this machine not used elsewhere. */
export async function checkAnswers(
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
