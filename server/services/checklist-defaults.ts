// The built-in walkaround checklists, one per machine category: used where a farm has not written
// its own, and loaded as each demo farm's editable templates. The tractor list follows published
// daily inspection items (CHECKS.md §5); the others are common practice. Cautions follow CHECKS.md §6.
// A list holds the items of the classes of its category too (checklist-class-items.ts); a machine
// walks the category's own items and those of its class.
import type { MachineCategory } from '../../shared/constants';
import type { MachineClass } from '../../shared/domain/service-library/classes';
import { CHECKLIST_PHASES, type ChecklistPhase } from '../../shared/schemas/walkarounds';
import type { ChecklistItem } from '../models/walkaround';
import type { ChecklistDefinition } from './checklist-items';
import { SELF_PROPELLED_CHECKLISTS } from './checklist-self-propelled';
import { TOWED_AND_ROAD_CHECKLISTS } from './checklist-towed-road';

const DEFINITIONS: Record<MachineCategory, ChecklistDefinition> = {
  tractor: SELF_PROPELLED_CHECKLISTS.tractor,
  combine: SELF_PROPELLED_CHECKLISTS.combine,
  sprayer: SELF_PROPELLED_CHECKLISTS.sprayer,
  baler: TOWED_AND_ROAD_CHECKLISTS.baler,
  loader: SELF_PROPELLED_CHECKLISTS.loader,
  mower: SELF_PROPELLED_CHECKLISTS.mower,
  truck: TOWED_AND_ROAD_CHECKLISTS.truck,
  implement: TOWED_AND_ROAD_CHECKLISTS.implement,
  other: SELF_PROPELLED_CHECKLISTS.other,
};

/** An item's phase: stored items from before phases have none and are walked before start. */
export const phaseOf = (i: Pick<ChecklistItem, 'phase'>): ChecklistPhase =>
  i.phase ?? 'before_start';

/**
 * The items a machine of this class walks, before-start ones first (each phase in list order):
 * the items for every machine of the category, and those named for its class. Without a class,
 * only the category's own.
 */
export function itemsForMachine(
  items: readonly ChecklistItem[],
  machineClass: MachineClass | null,
): ChecklistItem[] {
  const mine = items.filter((i) => {
    const classes = i.classes ?? [];
    return classes.length === 0 || (machineClass !== null && classes.includes(machineClass));
  });
  return CHECKLIST_PHASES.flatMap((phase) => mine.filter((i) => phaseOf(i) === phase));
}

const copy = (i: ChecklistItem): ChecklistItem => ({
  ...i,
  hazards: [...i.hazards],
  classes: [...(i.classes ?? [])],
});

/** The built-in list of a category with the items of all its classes (a fresh copy each time). */
export function builtInChecklist(category: MachineCategory): ChecklistDefinition {
  const d = DEFINITIONS[category];
  return { ...d, items: d.items.map(copy) };
}

/** The built-in checklist a machine of this category and class walks (a fresh copy each time). */
export function defaultChecklist(
  category: MachineCategory,
  machineClass: MachineClass | null = null,
): ChecklistDefinition {
  const d = builtInChecklist(category);
  return { ...d, items: itemsForMachine(d.items, machineClass) };
}
