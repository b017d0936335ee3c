// The machine classes of the service library: what a machine is, finer than its category, so
// that it can bring its own service schedule. Stored in machines.machine_class (migration 0017).
import type { MachineCategory, MeterUnit } from '../../constants';

export const MACHINE_CLASSES = [
  'row_crop_tractor',
  'articulated_tractor',
  'utility_loader_tractor',
  'combine',
  'sp_sprayer',
  'sp_windrower',
  'mower_conditioner',
  'round_baler',
  'square_baler',
  'forage_harvester',
  'telehandler',
  'mixer_wagon',
  'slurry_tanker',
  'grain_truck',
  'implement',
] as const;
export type MachineClass = (typeof MACHINE_CLASSES)[number];

export const MACHINE_CLASS_LABELS: Record<MachineClass, string> = {
  row_crop_tractor: '2WD/MFWD row-crop tractor',
  articulated_tractor: '4WD articulated tractor',
  utility_loader_tractor: 'Utility tractor with loader',
  combine: 'Combine',
  sp_sprayer: 'Self-propelled sprayer',
  sp_windrower: 'Self-propelled windrower',
  mower_conditioner: 'Trailed mower-conditioner',
  round_baler: 'Round baler',
  square_baler: 'Square baler',
  forage_harvester: 'Self-propelled forage harvester',
  telehandler: 'Telehandler',
  mixer_wagon: 'Mixer wagon',
  slurry_tanker: 'Slurry tanker',
  grain_truck: 'Grain truck',
  implement: 'Generic implement',
};

/** The category a machine of each class usually has (a machine keeps its own category). */
export const MACHINE_CLASS_CATEGORY: Record<MachineClass, MachineCategory> = {
  row_crop_tractor: 'tractor',
  articulated_tractor: 'tractor',
  utility_loader_tractor: 'tractor',
  combine: 'combine',
  sp_sprayer: 'sprayer',
  sp_windrower: 'mower',
  // trailed behind a tractor: walked round as an implement, not a self-propelled mower
  mower_conditioner: 'implement',
  round_baler: 'baler',
  square_baler: 'baler',
  forage_harvester: 'other',
  telehandler: 'loader',
  mixer_wagon: 'implement',
  slurry_tanker: 'implement',
  grain_truck: 'truck',
  implement: 'implement',
};

/** The meter unit a class's intervals count in: hours, except the truck's kilometres. */
export const MACHINE_CLASS_METER_UNIT: Record<MachineClass, MeterUnit> = Object.fromEntries(
  MACHINE_CLASSES.map((c) => [c, c === 'grain_truck' ? 'km' : 'h']),
) as Record<MachineClass, MeterUnit>;

/** A cell or a typed name ("Round baler", "round_baler", "round balers") as the class, or null. */
export function parseMachineClass(text: string): MachineClass | null {
  const key = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (!key) return null;
  for (const c of MACHINE_CLASSES) {
    const label = MACHINE_CLASS_LABELS[c].toLowerCase();
    if (key === c || key === c.replace(/_/g, ' ') || key === label || key === `${label}s`) return c;
  }
  return null;
}
