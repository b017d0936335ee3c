// Self-propelled sprayer and windrower. Common practice, not manufacturers' figures; the
// machine's operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import {
  calendarTasks,
  engineTasks,
  gearboxOil,
  grease,
  INSPECT_SELF_PROPELLED,
  libTask,
  wear,
  wheelNuts,
} from './common';
import { harvestPreSeason, harvestStorage, preSeasonService, storageService } from './season';

const RINSED =
  'Rinse the tank, pump, lines and boom with clean water first; wear the gloves and eye protection the product labels name. ';

const wheelMotors = (): TaskInput =>
  libTask({
    name: 'Wheel motor hub oil',
    intervalMeter: 1000,
    intervalDays: 730,
    labourHours: 1.5,
    hazards: ['hot_fluid'],
    instructions:
      "Drain each wheel hub or final drive warm; refill with the manual's oil to the level plug.",
  });

function sprayer(): TaskInput[] {
  return [
    ...engineTasks({ cab: 'charcoal' }),
    libTask({
      name: 'Nozzles, strainers and filters',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['chemicals'],
      parts: [wear('Spray nozzle, as worn', 6)],
      instructions: `${RINSED}Clean the main, pressure and nozzle strainers; check the flow of each nozzle against a new one and replace those 10 % over.`,
    }),
    grease(
      'Boom pivots, breakaways and suspension',
      50,
      ['raised_load', 'chemicals'],
      'Boom folded in its rests or unfolded on the ground. Grease the boom pivots, breakaway hinges, lift linkage and suspension points.',
    ),
    libTask({
      name: 'Boom and plumbing inspection',
      intervalMeter: 250,
      labourHours: 1,
      hazards: ['chemicals', 'hydraulic_pressure', 'power_lines'],
      instructions: `${RINSED}Look for cracked hoses, leaking fittings and worn boom wear pads; check the boom fold and height sensors. Unfold only where the boom cannot reach overhead lines.`,
    }),
    libTask({
      name: 'Sprayer pump check',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 1,
      hazards: ['chemicals'],
      parts: [wear('Pump diaphragm or seal kit, as worn')],
      instructions: `${RINSED}Check the pump's oil (diaphragm pumps) for milky colour, a sign of a split diaphragm; check seals and the pressure regulator.`,
    }),
    preSeasonService(14, {
      name: 'Pre-season calibration',
      labourHours: 2,
      hazards: ['chemicals'],
      instructions:
        'Two weeks before the season: check the rate controller against a measured output with clean water, the speed sensor against a measured distance, and the pressure gauge.',
    }),
    // within a week of the season's end: before the first frost splits a pump or a valve
    storageService(7, {
      name: 'Storage: flush and winterise the plumbing',
      labourHours: 2,
      hazards: ['chemicals'],
      instructions: `${RINSED}Flush with a tank cleaner the product labels allow and rinse again, then run antifreeze of a type the manual allows through the pump, filters, lines and every boom section until it shows at the nozzles. Catch the rinse water and antifreeze and dispose of them as the labels and local rules say, never into a drain or watercourse; wash gloves and boots after.`,
    }),
    wheelMotors(),
    wheelNuts(),
    ...calendarTasks(`${INSPECT_SELF_PROPELLED} Boom lights, eye-wash and clean-water tank.`),
  ];
}

function windrower(): TaskInput[] {
  return [
    ...engineTasks(),
    grease(
      'Daily grease points (header, conditioner, wobble box)',
      10,
      ['raised_load', 'stored_energy'],
      'Header on the ground or on its lift-cylinder locks. Grease the daily points of the chart.',
    ),
    libTask({
      name: 'Knife sections and guards',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['raised_load'],
      parts: [wear('Knife section, as worn', 10), wear('Knife guard, as worn', 2)],
      instructions:
        'Header on its locks. Replace broken or dull knife sections and bent guards; check the knife head bearing and hold-downs.',
    }),
    libTask({
      name: 'Conditioner and drive belts',
      intervalMeter: 50,
      labourHours: 0.5,
      hazards: ['stored_energy'],
      parts: [wear('Header drive belt, as worn')],
      instructions:
        'Check belt tension and wear and the conditioner roll gap and timing; replace belts only when worn. Tensioner springs stay loaded.',
    }),
    gearboxOil('Header gearbox oil', 'Header drive gearboxes and the wobble box.'),
    wheelMotors(),
    wheelNuts(),
    harvestPreSeason(
      'check the knife, guards and hold-downs, the conditioner rolls or tines, the reel or draper belts.',
    ),
    harvestStorage(
      'Storage service',
      'clean crop out of the header, conditioner and draper (it holds moisture), oil the knife against rust.',
    ),
    ...calendarTasks(`${INSPECT_SELF_PROPELLED} Header locks and knife guards.`),
  ];
}

export const CROP_CARE_CLASSES = {
  sp_sprayer: { description: 'A self-propelled boom sprayer with a sealed cab.', tasks: sprayer },
  sp_windrower: {
    description: 'A self-propelled windrower (swather) with a mower or draper header.',
    tasks: windrower,
  },
} as const;
