// Trailed hay machines: mower-conditioner, round and square balers, run on the tractor's PTO and
// counted in hours. Common practice, not manufacturers' figures; the operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import {
  calendarTasks,
  gearboxOil,
  grease,
  INSPECT_TRAILED,
  libTask,
  ptoShaft,
  wear,
  wheelNuts,
} from './common';
import { hayStorage, preSeasonService } from './season';

const LOCK_OUT =
  'Lower the machine, disengage the PTO, stop the tractor, take the key and wait until everything has stopped. ';

const dailyGrease = (what: string): TaskInput =>
  grease('Daily grease points', 10, ['pto', 'stored_energy'], `${LOCK_OUT}${what}`);

const pickup = (): TaskInput =>
  libTask({
    name: 'Pickup tines and guards',
    intervalMeter: 50,
    labourHours: 0.5,
    hazards: ['pto', 'raised_load'],
    parts: [wear('Pickup tine, as worn', 6)],
    instructions: `${LOCK_OUT}Pickup on the ground or on its lock. Replace broken or bent tines and check the strippers and gauge wheels.`,
  });

const slipClutch = (): TaskInput =>
  preSeasonService(14, {
    name: 'Slip clutch and shear bolts check',
    labourHours: 0.5,
    hazards: ['pto', 'stored_energy'],
    instructions: `${LOCK_OUT}Two weeks before the season, free a friction slip clutch as the manual says (it seizes in storage) and check its spring length; keep spare shear bolts of the right grade.`,
  });

function mowerConditioner(): TaskInput[] {
  return [
    ptoShaft(),
    libTask({
      name: 'Knives, discs and knife bolts',
      intervalMeter: 8,
      labourHours: 0.3,
      hazards: ['pto', 'raised_load', 'stored_energy'],
      parts: [wear('Mower knife, as worn', 2)],
      instructions: `${LOCK_OUT}Cutter bar on the ground or on its lock. Check every knife, bolt and disc for wear, cracks and damage; replace knives in pairs on one disc. Never run with a knife missing.`,
    }),
    dailyGrease('Grease the hinge, swivel and conditioner points of the chart.'),
    libTask({
      name: 'Conditioner and drive belts',
      intervalMeter: 50,
      labourHours: 0.5,
      hazards: ['pto', 'stored_energy'],
      parts: [wear('Conditioner drive belt, as worn'), wear('Conditioner tine, as worn', 4)],
      instructions: `${LOCK_OUT}Check belt tension and wear and the conditioner tines or rolls; replace only what is worn.`,
    }),
    gearboxOil('Cutter bar oil', 'Cutter bar, at its level plug with the bar level.'),
    gearboxOil('Main gearbox and angle drive oil', 'Input gearbox and the angle drives.'),
    slipClutch(),
    wheelNuts(),
    hayStorage(
      'oil the knives and cutter bar against rust, relieve the float springs as the manual says.',
    ),
    ...calendarTasks(`${INSPECT_TRAILED} Cutter bar curtains and guards.`, false, ['tyres_rims']),
  ];
}

function roundBaler(): TaskInput[] {
  return [
    ptoShaft(),
    dailyGrease('Grease the daily points and oil the drive chains (or check the automatic oiler).'),
    pickup(),
    libTask({
      name: 'Drive chains, belts and rollers',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['pto', 'stored_energy', 'raised_load'],
      parts: [wear('Chamber belt or lacing, as worn'), wear('Drive chain, as worn')],
      instructions: `${LOCK_OUT}Tailgate closed, or open on its lock valve and props. Check chain tension and stretch, belt tracking, lacing and roller bearings; replace only what is worn.`,
    }),
    libTask({
      name: 'Net and twine wrap check',
      intervalMeter: 50,
      labourHours: 0.3,
      hazards: ['pto', 'stored_energy'],
      parts: [wear('Net knife, as worn')],
      instructions: `${LOCK_OUT}Check the net knife edge, the brake and the duckbill; the knife is spring-loaded, cock or release it only as the manual says.`,
    }),
    gearboxOil('Main gearbox oil', 'Main input gearbox.'),
    slipClutch(),
    wheelNuts(),
    hayStorage(
      'take the net or twine out (it draws rodents), slacken the chamber belts or chains if the manual says so, tailgate closed.',
    ),
    ...calendarTasks(`${INSPECT_TRAILED} Tailgate lock valve and props.`, true, [
      'tyres_rims',
      'raised_load',
    ]),
  ];
}

function squareBaler(): TaskInput[] {
  return [
    ptoShaft(),
    dailyGrease('Grease the daily points, the knotter shafts and the needle yoke.'),
    pickup(),
    libTask({
      name: 'Knotters: billhooks, knives and twine path',
      intervalMeter: 50,
      labourHours: 1.5,
      hazards: ['pto', 'stored_energy'],
      parts: [wear('Billhook, as worn'), wear('Knotter knife arm, as worn')],
      instructions: `${LOCK_OUT}Flywheel stopped and braked. Clean the knotters, check billhooks, knife arms, twine discs and their tension; replace only what is worn.`,
    }),
    libTask({
      name: 'Plunger knife and stationary knife',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['pto', 'stored_energy'],
      parts: [wear('Plunger knife, as worn'), wear('Stationary knife, as worn')],
      instructions: `${LOCK_OUT}Flywheel stopped and braked. Sharpen or replace the knives and set the clearance; check plunger wear strips.`,
    }),
    gearboxOil('Main gearbox oil', 'Main gearbox (and the pre-compression drive if fitted).'),
    preSeasonService(14, {
      name: 'Needle timing and safety',
      labourHours: 1,
      hazards: ['pto', 'stored_energy'],
      instructions: `${LOCK_OUT}Two weeks before the season, check the needle-to-plunger timing and the needle safety shear bolt; a flywheel keeps turning for minutes after the PTO stops.`,
    }),
    slipClutch(),
    wheelNuts(),
    hayStorage(
      'clean and oil the knotters and billhooks against rust, take the twine out, release the bale chamber tension as the manual says.',
    ),
    ...calendarTasks(`${INSPECT_TRAILED} Flywheel brake, needle guards.`, true, ['tyres_rims']),
  ];
}

export const HAY_CLASSES = {
  mower_conditioner: {
    description: 'A trailed disc or sickle mower-conditioner on the tractor PTO.',
    tasks: mowerConditioner,
  },
  round_baler: { description: 'A round baler with net or twine wrap.', tasks: roundBaler },
  square_baler: { description: 'A small or large square baler with knotters.', tasks: squareBaler },
} as const;
