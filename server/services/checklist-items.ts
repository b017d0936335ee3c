// The pieces of the built-in walkaround checklists: the hazard cautions (shared/domain/hazards.ts), the item
// builder and the items several categories share. The lists themselves are in
// checklist-self-propelled.ts and checklist-towed-road.ts; checklist-defaults.ts picks one.
import { hazardCautionText } from '../../shared/domain/hazards';
import type { Hazard } from '../../shared/schemas/schedule';
import type { ChecklistItem } from '../models/walkaround';

/**
 * The caution of an item's hazards: shared/domain/hazards.ts, the one table the task cautions and
 * e-mails use too (each hazard's line, then the deferral once).
 */
export const cautionFor = (hazards: Hazard[]) => hazardCautionText(hazards);

export const item = (
  id: string,
  label: string,
  guidance: string,
  opts: { critical?: boolean; hazards?: Hazard[] } = {},
): ChecklistItem => ({
  id,
  label,
  guidance,
  critical: opts.critical ?? false,
  hazards: opts.hazards ?? [],
  caution: cautionFor(opts.hazards ?? []),
});

// Items several categories share (engine off, key out, on level ground unless the item says so).
export const I = {
  engineOil: item('engine-oil', 'Engine oil level', 'Between the marks on the dipstick.', {
    hazards: ['hot_fluid'],
  }),
  coolant: item('coolant', 'Coolant level', 'Check in the overflow tank, cold.', {
    hazards: ['hot_fluid'],
  }),
  fuel: item('fuel', 'Fuel level', 'Enough for the job; cap closed and sealed.'),
  hydraulicOil: item(
    'hydraulic-oil',
    'Hydraulic oil level',
    'With everything lowered to the ground, on the sight glass or dipstick.',
    { hazards: ['hydraulic_pressure'] },
  ),
  leaks: item(
    'leaks',
    'Leaks under the machine',
    'No fresh puddles or drips of oil, coolant, fuel or hydraulic oil.',
    { hazards: ['hydraulic_pressure'] },
  ),
  tyrePressure: item(
    'tyre-inflation',
    "Tyre inflation as the operator's manual says",
    'No tyre visibly low; check the pressure with a gauge when in doubt.',
    { hazards: ['tyres_rims'] },
  ),
  tyreDamage: item(
    'tyre-damage',
    'Cuts in treads and sidewalls',
    'No cuts, bulges or exposed cords.',
  ),
  wheelNuts: item('wheel-nuts', 'Wheel nuts', 'All present and tight; no rust streaks.', {
    critical: true,
  }),
  battery: item(
    'battery',
    'Battery hold-down and connections',
    'Held down firmly; terminals clean and tight; no cracks in the case.',
    { hazards: ['battery'] },
  ),
  cracked: item(
    'cracked-parts',
    'Cracked or broken parts',
    'Frame, hitch, mirrors, steps, handrails: nothing cracked, bent or broken.',
  ),
  hoses: item(
    'hoses',
    'Hydraulic hoses and fittings',
    'No damage, chafing, kinks or wet fittings.',
    { critical: true, hazards: ['hydraulic_pressure'] },
  ),
  shields: item(
    'shields',
    'All shields and guards in place',
    'Every shield and guard fitted and undamaged (OSHA 29 CFR 1928.57).',
    { critical: true, hazards: ['pto', 'stored_energy'] },
  ),
  ptoShield: item(
    'pto-master-shield',
    'PTO master shield in place',
    'Fitted and undamaged; stub shaft cap on when no shaft is connected (OSHA 29 CFR 1928.57).',
    { critical: true, hazards: ['pto'] },
  ),
  bolts: item('loose-bolts', 'Loose or missing bolts', 'Wheels, hitch, cab, loader mounts.'),
  smv: item(
    'smv-emblem',
    'Slow-moving-vehicle emblem',
    'Clean, not faded, mounted point up at the rear.',
  ),
  steps: item('steps', 'Steps and platform clean', 'No mud, oil, ice or loose tools.'),
  rops: item(
    'rops-seatbelt',
    'Rollover protective structure and seatbelt',
    'ROPS up and locked or cab undamaged; seatbelt latches and is not frayed (OSHA 29 CFR 1928.51).',
    { critical: true },
  ),
  oilPressure: item(
    'oil-pressure',
    'Oil pressure after start',
    'After starting: the warning light goes out and the gauge reads in range within seconds. If not, stop the engine.',
    { critical: true },
  ),
  lights: item(
    'lights',
    'Lights and flashers',
    'Head, tail, brake and hazard lights and beacons work.',
  ),
  hitch: item(
    'hitch',
    'Hitch, drawbar and linkage pins',
    'Pins and clips in place; three-point linkage and drawbar secure; implements lowered.',
    { hazards: ['raised_load', 'hitching_crush'] },
  ),
  belts: item(
    'belts',
    'Fan and drive belts',
    'No cracks or fraying; tension as the manual says (engine stopped).',
    { hazards: ['stored_energy'] },
  ),
  extinguisher: item(
    'extinguisher',
    'Fire extinguisher',
    'On board, gauge in the green, seal intact.',
  ),
  brakes: item(
    'brakes',
    'Service and parking brakes',
    'Pedals firm; parking brake holds (test at walking pace in a clear area).',
    { critical: true },
  ),
};

export interface ChecklistDefinition {
  name: string;
  description: string;
  items: ChecklistItem[];
}

export const COMMON_PRACTICE =
  'Items are common practice for this kind of machine, on the pattern of published tractor daily ' +
  "inspection lists; your operator's manual and local rules come first. Do the checks before " +
  'starting with the engine stopped, the key removed and everything lowered.';
