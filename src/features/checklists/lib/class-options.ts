import type { MachineCategory } from '../../../../shared/constants';
import {
  MACHINE_CLASSES,
  MACHINE_CLASS_CATEGORY,
  MACHINE_CLASS_LABELS,
  type MachineClass,
} from '../../../../shared/domain/service-library/classes';

/**
 * The classes an item of a category's checklist can be kept for: the classes whose machines
 * usually have that category, and any the list names already (a machine keeps its own category).
 */
export function classOptions(category: MachineCategory, named: readonly MachineClass[] = []) {
  return MACHINE_CLASSES.filter(
    (c) => MACHINE_CLASS_CATEGORY[c] === category || named.includes(c),
  ).map((value) => ({ value, label: MACHINE_CLASS_LABELS[value] }));
}
