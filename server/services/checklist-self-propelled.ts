// The built-in walkarounds of self-propelled machines: the tractor's follows published daily
// inspection items (CHECKS.md §5); the others are common practice on the same pattern. Each list
// is walked round first (engine off, key out) and ends in the seat with the engine running:
// brakes and parking brake, the brake pedal latch and the steering on every one of them.
import type { MachineCategory } from '../../shared/constants';
import { FORAGE_HARVESTER, LMI_TEST, LOADER_TRACTOR } from './checklist-class-items';
import {
  COMMON_PRACTICE,
  COOLING,
  I,
  IN_SEAT,
  item,
  type ChecklistDefinition,
} from './checklist-items';

const TRACTOR: ChecklistDefinition = {
  name: 'Tractor — daily walkaround',
  description:
    'Daily pre-operation walkaround for tractors. The items follow Michigan State University EHS, ' +
    '"Tractor Daily Inspection Checklist" (fluid levels and leaks, tyres and wheel nuts, battery, ' +
    'cracked parts, hoses, shields, loose bolts, slow-moving-vehicle emblem, steps, seatbelt, oil ' +
    'pressure after start, lights and flashers), with OSHA 29 CFR 1928.57 (guards in place, PTO ' +
    'master shield; stop the engine and wait for all motion to stop before servicing) and 29 CFR ' +
    '1928.51 (rollover protective structures and seatbelts). Walk round first with the engine ' +
    'stopped and the key removed; then check brakes, pedal latch, steering and lights from the ' +
    'seat with the engine running (common practice). A tractor with a loader (class: utility ' +
    "tractor with loader) also gets the loader's items. Your operator's manual and local rules " +
    'come first.',
  items: [
    LOADER_TRACTOR.lowered,
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
    LOADER_TRACTOR.pins,
    LOADER_TRACTOR.hoses,
    LOADER_TRACTOR.toolLock,
    I.belts,
    I.smv,
    I.steps,
    ...IN_SEAT,
  ],
};

// Before start on every self-propelled machine; its own items follow, then IN_SEAT.
const walkRound = [
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
];

const headerLock = item(
  'header-lock',
  'Header lift-cylinder safety lock',
  'The lock engages; never go under a raised header without it.',
  { critical: true, hazards: ['raised_load'] },
);

const chaff = item(
  'chaff',
  'Chaff and straw cleared',
  'Engine compartment, exhaust, bearings and batteries blown clean (fire risk).',
);

/** The lists of the self-propelled categories. */
export const SELF_PROPELLED_CHECKLISTS: Record<
  Extract<MachineCategory, 'tractor' | 'combine' | 'sprayer' | 'loader' | 'mower' | 'other'>,
  ChecklistDefinition
> = {
  tractor: TRACTOR,
  combine: {
    name: 'Combine — daily walkaround',
    description: `Daily pre-operation walkaround for combines. ${COMMON_PRACTICE}`,
    items: [
      ...walkRound,
      ...COOLING,
      headerLock,
      chaff,
      item('chains', 'Drive chains and feeder house', 'Tension and wear; no broken slats.', {
        hazards: ['stored_energy'],
      }),
      I.extinguisher,
      ...IN_SEAT,
    ],
  },
  sprayer: {
    name: 'Sprayer — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled sprayers. ${COMMON_PRACTICE}`,
    items: [
      ...walkRound,
      item(
        'boom-locks',
        'Boom transport locks and breakaways',
        'Locks hold in transport; breakaways return.',
        { critical: true, hazards: ['raised_load', 'hydraulic_pressure', 'power_lines'] },
      ),
      item('spray-lines', 'Tank, lines and nozzles', 'No leaks or drips of product; lids closed.', {
        hazards: ['chemicals'],
      }),
      item(
        'clean-water',
        'Clean-water tank and protective gear',
        'Wash-water tank full; gloves and eye protection on board.',
      ),
      ...IN_SEAT,
    ],
  },
  loader: {
    name: 'Loader / telehandler — daily walkaround',
    description: `Daily pre-operation walkaround for loaders and telehandlers; a telehandler (class: telehandler) also gets the load-moment indicator test. ${COMMON_PRACTICE}`,
    items: [
      ...walkRound,
      item(
        'boom-pins',
        'Boom, attachment and quick-hitch pins',
        'Every pin and lock in place; the attachment is locked on.',
        { critical: true, hazards: ['raised_load'] },
      ),
      item('load-chart', 'Load chart readable', 'In the cab and legible.'),
      ...IN_SEAT,
      LMI_TEST,
    ],
  },
  mower: {
    name: 'Mower-conditioner — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled mower-conditioners. ${COMMON_PRACTICE}`,
    items: [
      ...walkRound,
      headerLock,
      item(
        'cutterbar',
        'Cutterbar knives, discs and guards',
        'None missing, cracked or loose; curtains and guards fitted (thrown objects).',
        { critical: true, hazards: ['stored_energy'] },
      ),
      ...IN_SEAT,
    ],
  },
  other: {
    name: 'Machine — daily walkaround',
    description: `Daily pre-operation walkaround for self-propelled machines; a forage harvester (class: self-propelled forage harvester) also gets its cooling, intake and cutterhead items. ${COMMON_PRACTICE}`,
    items: [
      ...walkRound,
      ...FORAGE_HARVESTER,
      { ...chaff, classes: ['forage_harvester'] },
      I.extinguisher,
      ...IN_SEAT,
    ],
  },
};
