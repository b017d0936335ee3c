// The built-in walkaround checklists, one per machine category: used where a farm has not written
// its own, and loaded as each demo farm's editable templates. The tractor list follows published
// daily inspection items (CHECKS.md §5); the others are common practice. Cautions follow CHECKS.md §6.
import type { MachineCategory } from '../../shared/constants';
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

const item = (
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
const I = {
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

interface ChecklistDefinition {
  name: string;
  description: string;
  items: ChecklistItem[];
}

const COMMON_PRACTICE =
  'Items are common practice for this kind of machine, on the pattern of published tractor daily ' +
  "inspection lists; your operator's manual and local rules come first. Do the checks before " +
  'starting with the engine stopped, the key removed and everything lowered.';

const TRACTOR: ChecklistDefinition = {
  name: 'Tractor — daily walkaround',
  description:
    'Daily pre-operation walkaround for tractors. The items follow Michigan State University EHS, ' +
    '"Tractor Daily Inspection Checklist" (fluid levels and leaks, tyres and wheel nuts, battery, ' +
    'cracked parts, hoses, shields, loose bolts, slow-moving-vehicle emblem, steps, seatbelt, oil ' +
    'pressure after start, lights and flashers), with OSHA 29 CFR 1928.57 (guards in place, PTO ' +
    'master shield; stop the engine and wait for all motion to stop before servicing) and 29 CFR ' +
    '1928.51 (rollover protective structures and seatbelts). Do the checks before starting with ' +
    "the engine stopped and the key removed. Your operator's manual and local rules come first.",
  items: [
    I.engineOil,
    I.coolant,
    I.fuel,
    I.hydraulicOil,
    I.leaks,
    I.tyrePressure,
    I.tyreDamage,
    I.wheelNuts,
    I.battery,
    I.cracked,
    I.hoses,
    I.shields,
    I.ptoShield,
    I.bolts,
    I.hitch,
    I.belts,
    I.smv,
    I.steps,
    I.rops,
    I.oilPressure,
    I.lights,
  ],
};

const selfPropelledBase = [
  I.engineOil,
  I.coolant,
  I.fuel,
  I.hydraulicOil,
  I.leaks,
  I.tyrePressure,
  I.wheelNuts,
  I.battery,
  I.hoses,
  I.shields,
  I.belts,
  I.steps,
  I.rops,
  I.oilPressure,
  I.lights,
];

const headerLock = item(
  'header-lock',
  'Header lift-cylinder safety lock',
  'The lock engages; never go under a raised header without it.',
  { critical: true, hazards: ['raised_load'] },
);

const DEFINITIONS: Record<MachineCategory, ChecklistDefinition> = {
  tractor: TRACTOR,
  combine: {
    name: 'Combine — daily walkaround',
    description: `Daily pre-operation walkaround for combines. ${COMMON_PRACTICE}`,
    items: [
      ...selfPropelledBase,
      headerLock,
      item(
        'chaff',
        'Chaff and straw cleared',
        'Engine compartment, exhaust, bearings and batteries blown clean (fire risk).',
      ),
      item('chains', 'Drive chains and feeder house', 'Tension and wear; no broken slats.', {
        hazards: ['stored_energy'],
      }),
      I.extinguisher,
    ],
  },
  sprayer: {
    name: 'Sprayer — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled sprayers. ${COMMON_PRACTICE}`,
    items: [
      ...selfPropelledBase,
      item(
        'boom-locks',
        'Boom transport locks and breakaways',
        'Locks hold in transport; breakaways return.',
        { critical: true, hazards: ['raised_load', 'hydraulic_pressure'] },
      ),
      item('spray-lines', 'Tank, lines and nozzles', 'No leaks or drips of product; lids closed.'),
      item(
        'clean-water',
        'Clean-water tank and protective gear',
        'Wash-water tank full; gloves and eye protection on board.',
      ),
    ],
  },
  baler: {
    name: 'Baler — daily walkaround',
    description: `Daily walkaround for balers, with the tractor hitched and the engine stopped. ${COMMON_PRACTICE}`,
    items: [
      item(
        'pto-shaft',
        'PTO shaft guard',
        'Guard turns freely on the shaft; restraint chains fitted; slip clutch intact.',
        { critical: true, hazards: ['pto'] },
      ),
      item(
        'tailgate-lock',
        'Tailgate lock valve and props',
        'The lock valve closes and holds the open tailgate.',
        { critical: true, hazards: ['raised_load', 'hydraulic_pressure'] },
      ),
      item('pickup', 'Pickup tines and guards', 'No missing or broken tines; guards fitted.', {
        hazards: ['pto'],
      }),
      item('chains', 'Drive chains and belts', 'Tension, wear and tracking; no torn belts.', {
        hazards: ['stored_energy'],
      }),
      I.hoses,
      I.tyrePressure,
      I.wheelNuts,
      I.hitch,
      I.lights,
      I.smv,
      I.extinguisher,
    ],
  },
  loader: {
    name: 'Loader / telehandler — daily walkaround',
    description: `Daily pre-operation walkaround for loaders and telehandlers. ${COMMON_PRACTICE}`,
    items: [
      ...selfPropelledBase,
      item(
        'boom-pins',
        'Boom, attachment and quick-hitch pins',
        'Every pin and lock in place; the attachment is locked on.',
        { critical: true, hazards: ['raised_load'] },
      ),
      item('load-chart', 'Load chart readable', 'In the cab and legible.'),
      item('alarm', 'Horn and reverse alarm', 'Both sound.'),
      I.brakes,
    ],
  },
  mower: {
    name: 'Mower-conditioner — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled mower-conditioners. ${COMMON_PRACTICE}`,
    items: [
      ...selfPropelledBase,
      headerLock,
      item(
        'cutterbar',
        'Cutterbar knives, discs and guards',
        'None missing, cracked or loose; curtains and guards fitted (thrown objects).',
        { critical: true, hazards: ['stored_energy'] },
      ),
    ],
  },
  truck: {
    name: 'Truck — daily walkaround',
    description: `Daily pre-trip walkaround for farm trucks. ${COMMON_PRACTICE}`,
    items: [
      I.engineOil,
      I.coolant,
      I.fuel,
      I.leaks,
      I.tyrePressure,
      I.tyreDamage,
      I.wheelNuts,
      I.battery,
      item(
        'air-brakes',
        'Brakes and air pressure',
        'Air builds to working pressure with no audible leaks; brakes hold.',
        { critical: true, hazards: ['stored_energy'] },
      ),
      item(
        'body-prop',
        'Body down; body prop works',
        'Never work under a raised body without its prop.',
        {
          hazards: ['raised_load'],
        },
      ),
      item('mirrors', 'Mirrors and windscreen', 'Clean, not cracked, adjusted.'),
      I.lights,
      item('seatbelt', 'Seatbelt', 'Latches and is not frayed.', { critical: true }),
    ],
  },
  implement: {
    name: 'Trailed implement — daily walkaround',
    description: `Daily walkaround for trailed implements, hitched, with the tractor's engine stopped. ${COMMON_PRACTICE}`,
    items: [
      item(
        'hitch-pin',
        'Hitch pin, clip and safety chain',
        'Pin and clip in; safety chain attached to the tractor.',
        { critical: true, hazards: ['raised_load'] },
      ),
      item(
        'pto-shaft',
        'PTO shaft guard',
        'Guard turns freely on the shaft; restraint chains fitted.',
        { critical: true, hazards: ['pto'] },
      ),
      I.hoses,
      I.tyrePressure,
      I.wheelNuts,
      item('jack', 'Parking stand stowed', 'Stand raised and pinned for transport.', {
        hazards: ['raised_load'],
      }),
      I.shields,
      I.lights,
      I.smv,
    ],
  },
  other: {
    name: 'Machine — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled machines. ${COMMON_PRACTICE}`,
    items: [...selfPropelledBase, I.extinguisher],
  },
};

/** The built-in checklist of a category (a fresh copy each time). */
export function defaultChecklist(category: MachineCategory): ChecklistDefinition {
  const d = DEFINITIONS[category];
  return { ...d, items: d.items.map((i) => ({ ...i, hazards: [...i.hazards] })) };
}
