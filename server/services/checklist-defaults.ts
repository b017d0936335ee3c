// The built-in walkaround checklists, one per machine category: used where a farm has not written
// its own, and loaded as each demo farm's editable templates. The tractor list follows published
// daily inspection items (CHECKS.md §5); the others are common practice. Cautions follow CHECKS.md §6.
import type { MachineCategory } from '../../shared/constants';
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

/** The built-in checklist of a category (a fresh copy each time). */
export function defaultChecklist(category: MachineCategory): ChecklistDefinition {
  const d = DEFINITIONS[category];
  return { ...d, items: d.items.map((i) => ({ ...i, hazards: [...i.hazards] })) };
}
