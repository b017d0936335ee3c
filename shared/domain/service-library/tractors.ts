// Tractors: 2WD/MFWD row-crop, 4WD articulated, utility with loader. Common practice, not
// manufacturers' figures; the machine's operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import {
  calendarTasks,
  engineTasks,
  grease,
  INSPECT_SELF_PROPELLED,
  libTask,
  wheelNuts,
} from './common';

const INSPECT_TRACTOR = `${INSPECT_SELF_PROPELLED} Hitch pins, drawbar, PTO master shield.`;

const ptoClutch = (): TaskInput =>
  libTask({
    name: 'PTO clutch and brake check',
    intervalMeter: 1000,
    labourHours: 1.5,
    hazards: ['pto', 'stored_energy'],
    instructions:
      'Check PTO engagement, slip and brake stopping time against the manual; inspect the master shield. Nobody near the stub while testing.',
  });

const axleOil = (name: string, what: string): TaskInput =>
  libTask({
    name,
    intervalMeter: 1000,
    intervalDays: 730,
    labourHours: 1.5,
    hazards: ['hot_fluid', 'raised_load'],
    instructions: `${what} Drain warm, refill with the manual's oil to the level plugs; turn each hub so its drain plug is down. If the machine is raised, it rests on stands, never on the jack.`,
  });

const brakes = (): TaskInput =>
  libTask({
    name: 'Brakes and parking brake check',
    intervalMeter: 500,
    intervalDays: 365,
    labourHours: 0.5,
    instructions:
      'Check pedal travel, that the coupled pedals brake evenly, and that the parking brake holds on a slope; adjust or repair as the manual says.',
  });

function rowCropTractor(): TaskInput[] {
  return [
    ...engineTasks(),
    axleOil(
      'Front axle and planetary hub oil',
      'Front axle differential and both planetary hubs of the MFWD axle.',
    ),
    ptoClutch(),
    brakes(),
    grease(
      'Front axle, steering and hitch grease points',
      50,
      ['raised_load'],
      'Grease the front axle pivot, king pins, steering cylinder ends, three-point hitch and lift rods.',
    ),
    wheelNuts(),
    libTask({
      name: 'Hitch and drawbar check',
      intervalMeter: 250,
      labourHours: 0.3,
      hazards: ['hitching_crush'],
      instructions:
        'Check lower-link balls, top link, check chains, drawbar pin and hitch hook for wear and cracks; replace worn pins. Stand clear when anyone moves the tractor or the hitch.',
    }),
    ...calendarTasks(INSPECT_TRACTOR, true, ['pto']),
  ];
}

function articulatedTractor(): TaskInput[] {
  return [
    ...engineTasks(),
    axleOil(
      'Front and rear axle planetary oil',
      'Both axle differentials and all four planetary hubs.',
    ),
    grease(
      'Articulation and oscillation pivots',
      50,
      ['raised_load', 'hitching_crush'],
      'Grease the centre articulation pins, the oscillation pivot and the steering cylinder ends. Fit the frame lock before anyone goes between the frames.',
    ),
    grease(
      'Drive shaft crosses and centre bearing',
      50,
      ['pto'],
      'Grease the universal-joint crosses, slip joint and centre bearing of the drive shafts between the frames.',
    ),
    brakes(),
    wheelNuts(),
    libTask({
      name: 'Dual wheel clamps and tyre pressures',
      intervalMeter: 250,
      labourHours: 0.5,
      hazards: ['tyres_rims'],
      instructions:
        'Check the dual clamps or bolts for torque and the tyre pressures for the load and ballast of the season; look for cuts and bulges.',
    }),
    ...calendarTasks(INSPECT_TRACTOR, true, ['pto']),
  ];
}

function utilityLoaderTractor(): TaskInput[] {
  return [
    ...engineTasks({ def: false }),
    axleOil(
      'Front axle and planetary hub oil',
      'Front axle differential and both hubs of the 4WD front axle.',
    ),
    grease(
      'Loader pivots and bucket pins',
      10,
      ['raised_load', 'hydraulic_pressure'],
      'Bucket on the ground. Grease every loader pivot, the bucket and quick-coupler pins and the cylinder ends: daily work, about every 10 h.',
    ),
    libTask({
      name: 'Loader hoses, couplers and pins check',
      intervalMeter: 50,
      labourHours: 0.3,
      hazards: ['hydraulic_pressure', 'raised_load'],
      instructions:
        'Bucket on the ground and pressure relieved. Look for chafed hoses, leaking couplers and worn pins and bushes; check the quick-coupler locks engage fully.',
    }),
    ptoClutch(),
    brakes(),
    grease(
      'Front axle and hitch grease points',
      50,
      ['raised_load'],
      'Grease the front axle pivot, steering ends and three-point hitch.',
    ),
    wheelNuts(),
    ...calendarTasks(`${INSPECT_TRACTOR} Loader parking stands and the boom lock.`, true, [
      'pto',
      'raised_load',
    ]),
  ];
}

export const TRACTOR_CLASSES = {
  row_crop_tractor: {
    description: 'A two-wheel-drive or mechanical-front-wheel-drive tractor for field work.',
    tasks: rowCropTractor,
  },
  articulated_tractor: {
    description: 'A four-wheel-drive tractor that steers by bending in the middle.',
    tasks: articulatedTractor,
  },
  utility_loader_tractor: {
    description: 'A utility tractor that works most days with a front loader.',
    tasks: utilityLoaderTractor,
  },
} as const;
