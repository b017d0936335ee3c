// The pieces of the built-in walkaround checklists: the hazard cautions (CHECKS.md §6), the item
// builder and the items several categories share. The lists themselves are in
// checklist-self-propelled.ts and checklist-towed-road.ts; checklist-defaults.ts picks one.
import type { Hazard } from '../../shared/schemas/schedule';
import type { ChecklistItem } from '../models/walkaround';

const DEFER = "Follow the operator's manual and local rules.";

/** The caution shown beside an item per hazard; each ends by deferring to the manual and local rules. */
export const HAZARD_CAUTIONS: Record<Hazard, string> = {
  pto:
    'PTO: a 540 rpm shaft turns 9 times a second and a 1,000 rpm shaft about 16.6 times — no one ' +
    'can react in time. Never step over a turning shaft; disengage the PTO and stop the engine ' +
    `before you dismount (Clemson University Cooperative Extension). ${DEFER}`,
  hydraulic_pressure:
    'Hydraulic pressure: a pinhole leak can inject oil through the skin. Search for leaks with a ' +
    'piece of cardboard, never your fingers, and get medical help at once if oil enters the skin ' +
    `(Colorado State University Extension, fact sheet 5.017). ${DEFER}`,
  raised_load:
    'Raised implements: lower them to the ground or block them securely before going near or ' +
    'under; set the brakes and chock the wheels (Ohio State University Extension, "Safe Use of ' +
    `Jacks"). ${DEFER}`,
  stored_energy:
    'Stored energy: springs held by snap rings, belts and chains under tension and accumulators ' +
    'keep their force after the engine stops; release or compress them only with a press or the ' +
    `proper tool (common practice). ${DEFER}`,
  hot_fluid:
    'Hot fluids: check levels with the engine stopped and cooled; never open a hot radiator or ' +
    `coolant cap. ${DEFER}`,
  battery:
    'Battery: keep sparks and flames away and protect your eyes; batteries give off explosive ' +
    `gas. ${DEFER}`,
};

/** The caution text of a set of hazards, in the order given. */
export const cautionFor = (hazards: Hazard[]) => hazards.map((h) => HAZARD_CAUTIONS[h]).join(' ');

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
    { hazards: ['raised_load'] },
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
