// Harvesters: combine and self-propelled forage harvester. Common practice, not manufacturers'
// figures; the machine's operator's manual wins.
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
import { harvestPreSeason, harvestStorage } from './season';

const LOCK_OUT = 'Stop the engine, take the key and wait until every drive has stopped. ';

const finalDrives = (): TaskInput =>
  libTask({
    name: 'Final drive and planetary oil',
    intervalMeter: 1000,
    intervalDays: 730,
    labourHours: 1.5,
    hazards: ['hot_fluid'],
    instructions:
      "Drain both final drives (and the rear axle hubs if driven) warm; refill with the manual's oil to the level plugs.",
  });

const cleanDown = (what: string): TaskInput =>
  libTask({
    name: 'Daily clean-down and radiator screen',
    intervalMeter: 10,
    labourHours: 0.5,
    hazards: ['hot_fluid', 'stored_energy'],
    dailyCare: true,
    instructions: `${LOCK_OUT}Blow chaff and dust off the engine deck, exhaust, ${what} and the rotary screen; crop build-up near hot parts starts fires. Do not open the cooling system hot.`,
  });

function combine(): TaskInput[] {
  return [
    ...engineTasks({ screen: false }),
    cleanDown('bearings'),
    grease(
      'Daily grease points (feeder, beaters, header drive)',
      10,
      ['raised_load', 'stored_energy'],
      'Header on the ground or on the cylinder lock. Grease the daily points of the lubrication chart.',
    ),
    libTask({
      name: 'Drive belts and chains inspection',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['stored_energy'],
      parts: [wear('Drive belt, as worn'), wear('Feeder house chain slat, as worn', 2)],
      instructions: `${LOCK_OUT}Check belt tension, cracks and glazing, chain tension and slats; replace belts and slats only when worn. Tensioner springs stay loaded.`,
    }),
    libTask({
      name: 'Threshing and separating wear check',
      intervalMeter: 250,
      intervalDays: 365,
      labourHours: 2,
      parts: [wear('Rasp bar or rotor element, as worn', 2), wear('Concave section, as worn')],
      instructions: `${LOCK_OUT}Check rasp bars or rotor elements, concaves and separator grates for wear and damage; record the concave setting before changing anything.`,
    }),
    libTask({
      name: 'Straw chopper knives',
      intervalMeter: 250,
      labourHours: 1,
      hazards: ['stored_energy'],
      parts: [wear('Chopper knife, as worn', 4)],
      instructions: `${LOCK_OUT}Replace cracked or worn knives in opposite pairs to keep the rotor balanced; wait for the rotor to run down, it turns for minutes.`,
    }),
    gearboxOil(
      'Header and feeder gearbox oil',
      'Header drive gearboxes, reel drive and feeder reverser.',
    ),
    finalDrives(),
    wheelNuts(),
    harvestPreSeason(
      'check the header knife, guards, reel tines and auger fingers; set the concave and sieves for the first crop and check the rasp bars or rotor elements.',
    ),
    harvestStorage(
      'Storage: clean out and protect',
      'clean grain and chaff out of the tank, elevators, sieves, returns and header (they draw moisture and rodents), run the machine empty to clear the augers, touch up bare paint.',
    ),
    ...calendarTasks(
      `${INSPECT_SELF_PROPELLED} Header lock, unloading auger guards, fire-risk areas.`,
    ),
  ];
}

function forageHarvester(): TaskInput[] {
  return [
    ...engineTasks({ screen: false }),
    cleanDown('the knife drum housing'),
    libTask({
      name: 'Knife sharpening and shear bar adjustment',
      intervalMeter: 10,
      labourHours: 0.5,
      hazards: ['stored_energy'],
      parts: [wear('Chopping knife, as worn', 2), wear('Shear bar, as worn')],
      instructions: `${LOCK_OUT}Sharpen the knives with the built-in grinder as the manual says, then set the shear bar clearance; replace knives and the shear bar when worn to their limit. Knives are sharp: wear cut-resistant gloves.`,
    }),
    grease(
      'Daily grease points (feed rolls, spout, header)',
      10,
      ['raised_load'],
      'Header on the ground. Grease the feed rolls, spout and header points of the chart.',
    ),
    libTask({
      name: 'Kernel processor and blower wear check',
      intervalMeter: 250,
      labourHours: 1.5,
      hazards: ['stored_energy'],
      parts: [wear('Blower paddle, as worn', 2), wear('Processor roll set, as worn')],
      instructions: `${LOCK_OUT}Check the processor roll gap and teeth, the blower paddles and the spout liners; replace only what is worn.`,
    }),
    libTask({
      name: 'Drive belts inspection',
      intervalMeter: 50,
      labourHours: 0.5,
      hazards: ['stored_energy'],
      parts: [wear('Main drive belt, as worn')],
      instructions: `${LOCK_OUT}Check the main drive belt tension and condition; the tensioner stays loaded.`,
    }),
    gearboxOil('Feed roll and header gearbox oil', 'Feed roll gearbox and the header drives.'),
    finalDrives(),
    wheelNuts(),
    harvestPreSeason(
      'test the metal detector and stone trap, check the knives, shear bar and processor roll gap, and the spout liners.',
    ),
    harvestStorage(
      'Storage service',
      'wash crop residue out of the knife drum housing, blower and spout (wet residue corrodes them), oil the knives and shear bar against rust.',
    ),
    ...calendarTasks(`${INSPECT_SELF_PROPELLED} Spout, knife drum guards, metal detector test.`),
  ];
}

export const HARVESTER_CLASSES = {
  combine: { description: 'A self-propelled grain combine with its header.', tasks: combine },
  forage_harvester: {
    description: 'A self-propelled forage harvester (chopper) with its header.',
    tasks: forageHarvester,
  },
} as const;
