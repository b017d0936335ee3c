// The service library: for each machine class its own set of service tasks, offered to every
// farm (a new farm has no templates of its own). Every interval is common practice, not a
// manufacturer's figure, and the machine's operator's manual wins.
import type { MachineCategory, MeterUnit } from '../../constants';
import type { TaskInput } from '../../schemas/schedule';
import {
  MACHINE_CLASS_CATEGORY,
  MACHINE_CLASS_LABELS,
  MACHINE_CLASS_METER_UNIT,
  MACHINE_CLASSES,
  type MachineClass,
} from './classes';
import { CROP_CARE_CLASSES } from './crop-care';
import { HARVESTER_CLASSES } from './harvesters';
import { HAY_CLASSES } from './hay';
import { classVariant, tasksInMeterUnit } from './meter-variants';
import { ROAD_AND_OTHER_CLASSES } from './road-and-other';
import { TRACTOR_CLASSES } from './tractors';
import { YARD_CLASSES } from './yard';

export * from './classes';
export { classMeterUnits, roundDownMeterFigure } from './meter-variants';
export { COMMON_PRACTICE_NOTE, SERVICE_LIBRARY_NOTE } from './common';

export interface LibraryClass {
  machineClass: MachineClass;
  label: string;
  description: string;
  /** the category a machine of this class usually has */
  category: MachineCategory;
  /** the unit its meter intervals count in */
  meterUnit: MeterUnit;
  /** how the figures were converted from the class's own unit (meter-variants.ts), or null */
  conversion: string | null;
  tasks: TaskInput[];
}

const DEFINITIONS: Record<MachineClass, { description: string; tasks: () => TaskInput[] }> = {
  ...TRACTOR_CLASSES,
  ...HARVESTER_CLASSES,
  ...CROP_CARE_CLASSES,
  ...HAY_CLASSES,
  ...YARD_CLASSES,
  ...ROAD_AND_OTHER_CLASSES,
};

/**
 * The library's set of a class: its tasks with intervals in the class's meter unit, or in
 * `meterUnit` when the class has a variant in it (miles for the truck, bales for the balers).
 */
export function serviceLibraryClass(
  machineClass: MachineClass,
  meterUnit: MeterUnit = MACHINE_CLASS_METER_UNIT[machineClass],
): LibraryClass {
  const d = DEFINITIONS[machineClass];
  const variant = classVariant(machineClass, meterUnit);
  return {
    machineClass,
    label: MACHINE_CLASS_LABELS[machineClass],
    description: d.description,
    category: MACHINE_CLASS_CATEGORY[machineClass],
    meterUnit: variant?.unit ?? MACHINE_CLASS_METER_UNIT[machineClass],
    conversion: variant?.note ?? null,
    tasks: variant ? tasksInMeterUnit(machineClass, d.tasks(), meterUnit) : d.tasks(),
  };
}

/** Every class of the library, in the order of MACHINE_CLASSES. */
export const serviceLibrary = (): LibraryClass[] =>
  MACHINE_CLASSES.map((c) => serviceLibraryClass(c));
